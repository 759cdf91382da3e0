/**
 * Revision letters of a submittal: A, B, … Z, then AA, AB, … AZ, BA, … ZZ, AAA (bijective
 * base 26, the way spreadsheet columns count), so no letter is ever used twice and they sort by
 * length, then alphabetically.
 */

const LETTER = /^[A-Z]+$/;

/** The letter of the revision at `index` (0 → "A", 25 → "Z", 26 → "AA"). */
export function revisionLetter(index: number): string {
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`A revision index is a whole number from 0, not ${index}.`);
  let n = index + 1;
  let letters = "";
  while (n > 0) {
    const digit = (n - 1) % 26;
    letters = String.fromCharCode(65 + digit) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

/** The index of a revision letter ("A" → 0, "AA" → 26); null when the text is not a letter. */
export function revisionIndex(letter: string): number | null {
  if (!LETTER.test(letter)) return null;
  let n = 0;
  for (const ch of letter) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n - 1;
}

/** The letter after `previous` ("A" for the first revision). */
export function nextRevisionLetter(previous: string | null): string {
  if (previous === null) return revisionLetter(0);
  const index = revisionIndex(previous);
  if (index === null) throw new RangeError(`"${previous}" is not a revision letter.`);
  return revisionLetter(index + 1);
}

/** Orders revision letters as they were issued: B before AA. */
export function compareRevisions(a: string, b: string): number {
  return (revisionIndex(a) ?? -1) - (revisionIndex(b) ?? -1);
}
