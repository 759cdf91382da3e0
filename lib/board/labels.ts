/**
 * Placement codes ("P-001") and the way lengths read in the board's messages. Codes are what
 * the consultant, the installer and the shop drawing call a panel, so they are short, padded to
 * three digits for tidy lists, and grow past P-999 without breaking.
 */
import type { Placement } from "./types";

const PREFIX = "P-";
const CODE = /^P-(\d+)$/;

export function formatCode(n: number): string {
  return `${PREFIX}${String(n).padStart(3, "0")}`;
}

/** The number in a code, or null when the text is not a code. */
export function parseCode(code: string): number | null {
  const m = CODE.exec(code.trim());
  return m ? Number(m[1]) : null;
}

/**
 * The next `count` codes after the highest in use. Gaps left by deleted panels are not refilled:
 * a code once shown on a printed drawing should not come back as a different panel.
 */
export function nextCodes(taken: Iterable<string | undefined>, count: number): string[] {
  let highest = 0;
  for (const code of taken) {
    const n = code === undefined ? null : parseCode(code);
    if (n !== null && n > highest) highest = n;
  }
  return Array.from({ length: count }, (_, i) => formatCode(highest + 1 + i));
}

export function nextCode(taken: Iterable<string | undefined>): string {
  return nextCodes(taken, 1)[0];
}

/** What messages call a placement: its code, or its id when it has none yet. */
export const labelOf = (p: Pick<Placement, "id" | "code">) => p.code ?? p.id;

/** Orders codes by their number (P-002 before P-010), other labels after them by text. */
export function compareLabels(a: string, b: string): number {
  const na = parseCode(a);
  const nb = parseCode(b);
  if (na !== null && nb !== null) return na - nb || (a < b ? -1 : a > b ? 1 : 0);
  if (na !== null) return -1;
  if (nb !== null) return 1;
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * A length as a number of millimetres for messages, to a tenth, without a trailing ".0":
 * 0.04 → "40", 0.0495 → "49.5" (so a gap just under the clearance never reads as equal to it);
 * a positive length too small to show is "<0.1", never "0".
 */
export function formatMm(metres: number): string {
  if (metres > 0 && metres < 0.00005) return "<0.1";
  const tenths = Math.round(metres * 10_000) / 10;
  return `${Object.is(tenths, -0) ? 0 : tenths}`;
}
