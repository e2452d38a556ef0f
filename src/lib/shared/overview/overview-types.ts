// The figures of the lead's overview, as the service computes them and the page, JSON and CSV show them.
import type { GarmentStep } from '../garment-steps';
import type { Currency } from '../../pricing/money';
import type { Period } from './shop-days';

/** One day of the period. */
export interface OverviewDay {
  /** YYYY-MM-DD in the shop's time zone */
  day: string;
  /** garments taken in (created) that day */
  takenIn: number;
  /** garments handed over (collected) that day */
  handedOver: number;
  /** garments due that day that are ready or collected */
  dueDone: number;
  /** garments due that day, not ready yet, the day not past */
  dueOpen: number;
  /** garments due that day, not ready yet, the day past */
  overdue: number;
  /** money taken that day per payment method less refunds given back that day, in minor units */
  takings: Record<string, number>;
}

/** The shop's overview for a period. */
export interface Overview {
  period: Period;
  timeZone: string;
  currency: Currency;
  /** today in the shop's time zone */
  today: string;
  days: OverviewDay[];
  /** garments not ready whose due date is before the period's first day */
  overdueBefore: number;
  /** garments not ready whose due date has passed, whatever the period */
  overdueNow: number;
  /** garments at each step now, received to ready (collected is handed over, not waiting) */
  waiting: { step: GarmentStep; label: string; garments: number }[];
  /** money taken in the period per payment method, less what was refunded (refundedMinor), in minor units */
  takings: { method: string; amountMinor: number; payments: number; refundedMinor: number }[];
  /** garments that became ready in the period, and their average days from intake (null: none) */
  intakeToReady: { garments: number; averageDays: number | null };
}
