// Money on screen: integer minor units shown in the shop's currency with Intl.NumberFormat.

/** The currencies a shop can choose, with their minor-unit digits (ISO 4217). */
export const CURRENCIES = { EUR: 2, GBP: 2, USD: 2, CHF: 2, SEK: 2, NOK: 2, DKK: 2, CAD: 2, AUD: 2, JPY: 0 } as const;
/** A currency code a shop can choose. */
export type Currency = keyof typeof CURRENCIES;

/** True when the code is one of the supported currencies. */
export function isCurrency(code: unknown): code is Currency {
  return typeof code === 'string' && code in CURRENCIES;
}

/** Minor units as money text, e.g. 4550 EUR → "€45.50". */
export function formatMoney(minor: number, currency: Currency, locale = 'en-GB'): string {
  const digits = CURRENCIES[currency];
  return new Intl.NumberFormat(locale, { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits }).format(
    minor / 10 ** digits,
  );
}

/** Money as typed ("45.50", "45,5", "45") to minor units; null when it is not an amount. */
export function parseMoney(text: string, currency: Currency): number | null {
  const digits = CURRENCIES[currency];
  const clean = text
    .trim()
    .replace(/^[^\d-]+/, '')
    .replace(',', '.');
  const re = digits === 0 ? /^-?\d+$/ : new RegExp(`^-?\\d+(\\.\\d{1,${digits}})?$`);
  if (!re.test(clean)) return null;
  const [whole, frac = ''] = clean.replace('-', '').split('.');
  const minor = Number(whole) * 10 ** digits + Number(frac.padEnd(digits, '0') || '0');
  return clean.startsWith('-') ? -minor : minor;
}
