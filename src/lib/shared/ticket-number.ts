// How a ticket's number is written, once, for every place a customer or the bench reads it: the
// screens, the claim slip, the cut sheet, e-mails and notices. As on a paper ticket book: the
// shop's initials and the plain number ("PH 1001" for Pinmark & Hem). Pure: ships in islands too.

/** Short joining words left out of a shop's initials ("Hem and Cuff" is "HC"). */
const JOINERS = new Set(['and', 'of', 'the', 'de', 'la', 'le', 'du', 'der', 'die', 'das', 'und', 'et', 'y', 'e']);

/** The shop's initials for its ticket book: first letter of each word (joiners and "&" skipped), at most 3, upper case; '' when the name has no letters. */
export function shopInitials(shopName: string): string {
  const words = shopName
    .trim()
    .split(/[\s\-–—_/.,]+/u)
    .filter((w) => /\p{L}/u.test(w));
  const kept = words.filter((w) => !JOINERS.has(w.toLowerCase()));
  const letters = (kept.length > 0 ? kept : words).map((w) => w.match(/\p{L}/u)![0]);
  return letters.slice(0, 3).join('').toLocaleUpperCase();
}

/** A ticket's number as written in the shop's ticket book: "PH 1001"; "No. 1001" for a shop name without letters. */
export function ticketLabel(number: number, shopName: string): string {
  const initials = shopInitials(shopName);
  return initials ? `${initials} ${number}` : `No. ${number}`;
}

/** The ticket number a search text names ("PH 1001", "ph1001", "No. 1001", "1001", an old "T-1001"), as digits; null when it names none. */
export function ticketSearchNumber(text: string): string | null {
  const m = text.trim().match(/^(?:\p{L}{1,4}\.?[\s-]*)?(\d+)$/u);
  return m ? m[1]! : null;
}
