/**
 * A result is printed only if every number in it is a finite number: NaN and ±Infinity are not
 * JSON (they would print as null) and mean the input lies outside what the models cover. The
 * limits of the schemas keep this from happening for any input they accept; this is the last
 * check before anything is printed or sent.
 */
import type { FieldError } from "./parse";

/** Dotted paths of the values in `output` that are numbers but not finite. */
export function nonFinitePaths(output: unknown, path: string[] = []): string[] {
  if (typeof output === "number") return Number.isFinite(output) ? [] : [path.join(".")];
  if (Array.isArray(output)) return output.flatMap((item, i) => nonFinitePaths(item, [...path, String(i)]));
  if (output && typeof output === "object") return Object.entries(output).flatMap(([key, value]) => nonFinitePaths(value, [...path, key]));
  return [];
}

/** The refusal for a result that is not all finite numbers, naming what came out wrong. */
export function nonFiniteErrors(output: unknown): FieldError[] {
  const paths = nonFinitePaths(output);
  if (paths.length === 0) return [];
  const shown = paths.slice(0, 5).join(", ") + (paths.length > 5 ? ` and ${paths.length - 5} more` : "");
  return [
    {
      field: "",
      message: `the calculation gave no finite number for ${shown}: the input lies outside what the models cover, so nothing is returned`,
    },
  ];
}
