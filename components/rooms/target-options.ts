import { DIN_GROUPS } from "@/lib/rooms/din-18041";
import type { TargetSpec } from "@/lib/rooms/target-spec";

// The target picker's choices; "" means the default for the room's use.
const DIN_WORDS: Record<string, string> = {
  A1: "A1 music",
  A2: "A2 speech, lecture",
  A3: "A3 teaching, communication",
  A4: "A4 inclusive teaching",
  A5: "A5 sport",
};

export const TARGET_OPTIONS: { value: string; label: string }[] = [
  { value: "", label: "Default for the room's use" },
  ...DIN_GROUPS.map((g) => ({ value: `din:${g}`, label: `DIN 18041 group ${DIN_WORDS[g]}` })),
  { value: "ansi", label: "ANSI/ASA S12.60 classroom limit" },
  { value: "cp:office", label: "Office, 0.4–0.8 s (common practice)" },
  { value: "cp:open-plan", label: "Open-plan, 0.4–0.8 s (common practice)" },
  { value: "cp:restaurant", label: "Restaurant or café, 0.4–0.8 s (common practice)" },
  { value: "manual", label: "Entered by hand, per octave" },
];

export function targetValue(spec: TargetSpec | null): string {
  if (!spec) return "";
  if (spec.kind === "din-18041") return `din:${spec.group}`;
  if (spec.kind === "ansi-s12-60") return "ansi";
  if (spec.kind === "common-practice") return `cp:${spec.use}`;
  return "manual";
}

export function targetFromValue(value: string, previous: TargetSpec | null): TargetSpec | null {
  if (value === "") return null;
  if (value.startsWith("din:")) return { kind: "din-18041", group: value.slice(4) as (typeof DIN_GROUPS)[number] };
  if (value === "ansi") return { kind: "ansi-s12-60" };
  if (value.startsWith("cp:")) return { kind: "common-practice", use: value.slice(3) as "office" | "open-plan" | "restaurant" };
  return previous?.kind === "manual" ? previous : { kind: "manual", seconds: { "125": 1, "250": 1, "500": 1, "1000": 1, "2000": 1, "4000": 1 } };
}
