// Money in the shop's currency, large where it is read across the counter.
import { formatMoney, type Currency } from '@/lib/pricing/money';

/** An amount in minor units, formatted with Intl.NumberFormat; tabular figures line up in columns. */
export function Money({ minor, currency, className = '' }: { minor: number; currency: Currency; className?: string }) {
  return <span className={`tabular-nums ${className}`}>{formatMoney(minor, currency)}</span>;
}
