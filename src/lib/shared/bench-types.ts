// The shapes the bench's API routes answer with, for the islands to type their queries.
import type { Language } from '@/lib/shared/i18n/languages';
import type { ContactPreference } from './contact-channels';
import type { ExistingFinish } from './existing-finish';
import type { GarmentStep } from './garment-steps';
import type { Scale } from './bench-requests';
import type { FittingRule } from './fitting-rule';
import type { SavedLeg } from './measurement-request';
import type { WaistOrder } from './waist-order';
import type { WaistNote } from './cut-sheet-types';
import type { GarmentKindId } from './fitting/garment-kinds';

/** A person a garment can be given to. */
export interface Person {
  userId: string;
  name: string;
  role: string;
}

/** The shop's bench settings. */
export interface BenchSettings {
  scale: Scale;
  stepLabels: Partial<Record<GarmentStep, string>>;
  /** a garment passing Chalk-marked with no fitting saved: warned on screen, or refused by the server */
  fittingRule: FittingRule;
  /** a waist change still to do: move the pin mark by it, or alter the waist first and pin after */
  waistOrder: WaistOrder;
  /** the language of the shop's screens and sheets */
  language: Language;
}

/** A garment as listed on its ticket. */
export interface GarmentSummary {
  id: string;
  description: string;
  /** what kind of garment (fitting/garment-kinds.ts); absent on rows read before kinds were shown: trousers */
  kind?: GarmentKindId;
  status: GarmentStep;
  dueOn: string | null;
  assigneeId: string | null;
  assigneeName: string | null;
}

/** One garment in the queue, with its ticket and customer named. */
export interface QueueRow extends GarmentSummary {
  ticketId: string;
  ticketNumber: number;
  customerName: string | null;
  /** only for roles that may read customers: the queue's search finds by it */
  customerPhone?: string | null;
  /** a ready garment's last move to ready (ISO, UTC): how long it has waited for its customer; null otherwise */
  readyAt?: string | null;
}

/** One choice of the queue's "Tailor" (who) filter: a value matchesQueue reads and its words. */
export interface WhoOption {
  value: string;
  label: string;
}

/** The customer as a ticket or garment shows them; the contact details only to roles that may read customers. */
export interface CustomerCard {
  id: string;
  name: string;
  phone?: string | null;
  email?: string | null;
  notes?: string | null;
  /** how notices reach them (only with the contact details) */
  contactBy?: ContactPreference;
}

/** A ticket with its customer and garments. */
export interface TicketDetail {
  id: string;
  number: number;
  status: GarmentStep;
  note: string | null;
  dueOn: string | null;
  createdAt: string;
  customer: CustomerCard | null;
  garments: TicketGarment[];
}

/** A garment on its ticket's page: also whether a fitting is saved, so moving it past Chalk-marked can ask first. */
export interface TicketGarment extends GarmentSummary {
  /** a fitting is saved and can be cut by (a plan for each leg) */
  fitted: boolean;
}

/** One recorded change, newest first on screen. */
export interface AuditEntry {
  id: string;
  at: string;
  actorName: string | null;
  action: string;
  detail: Record<string, unknown>;
}

/** A garment with its ticket and customer. */
export interface GarmentDetail extends TicketGarment {
  /** how the bottoms came in (plain hem, cuff, unfinished) */
  existingFinish: ExistingFinish;
  ticket: { id: string; number: number; status: GarmentStep; note: string | null };
  customer: CustomerCard | null;
}

/** A garment's fitting: both legs as saved and every recorded change, newest first. */
export interface FittingView {
  legs: SavedLeg[];
  history: AuditEntry[];
  /** each leg's pending waist change and where it moves the pin mark, in the shop's scale (as the sheet prints it) */
  waist?: Partial<Record<'left' | 'right', WaistNote>>;
}
