/** A problem with a room's input, named by its dotted field path ("surfaces.2.openings.0.width"). */
export interface Issue {
  field: string;
  message: string;
  /** an error stops the check; a warning is shown beside a result that is still computed */
  severity: "error" | "warning";
}

export const error = (field: string, message: string): Issue => ({ field, message, severity: "error" });
export const warning = (field: string, message: string): Issue => ({ field, message, severity: "warning" });

export const hasErrors = (issues: readonly Issue[]) => issues.some((issue) => issue.severity === "error");

/** Join a dotted path, leaving out an empty prefix. */
export const at = (prefix: string, ...parts: (string | number)[]) => [prefix, ...parts].filter((p) => p !== "").join(".");

/** A length, area or volume as it is quoted in messages: four significant figures. */
export const quote = (value: number, unit: string) => `${Number(value.toPrecision(4))} ${unit}`;
