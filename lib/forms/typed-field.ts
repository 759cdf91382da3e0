/**
 * What a typed field does when the person leaves it or presses Enter. A field commits only what
 * the person typed: text they did not edit, or edited back to exactly what was shown, commits
 * nothing, so the rounding of a display can never reach the stored value; text that does not
 * parse is refused with the parser's message and commits nothing either.
 */
export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

export type CommitDecision<T> =
  /** nothing to commit: show the stored value again */
  | { kind: "keep" }
  | { kind: "refuse"; message: string }
  /** commit `value`, and show it as `text` */
  | { kind: "commit"; value: T; text: string };

export function decideCommit<T>(args: {
  text: string;
  /** what the field showed for the stored value */
  shown: string;
  /** whether the person typed in the field since it last showed the stored value */
  edited: boolean;
  current: T;
  parse: (text: string) => Parsed<T>;
  format: (value: T) => string;
  equal?: (a: T, b: T) => boolean;
}): CommitDecision<T> {
  const { text, shown, edited, current, parse, format, equal = Object.is } = args;
  if (!edited || text.trim() === shown.trim()) return { kind: "keep" };
  const parsed = parse(text);
  if (!parsed.ok) return { kind: "refuse", message: parsed.message };
  if (equal(parsed.value, current)) return { kind: "keep" };
  return { kind: "commit", value: parsed.value, text: format(parsed.value) };
}
