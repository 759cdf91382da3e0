/**
 * What a room's reverberation target is made of: a published guideline with its parameters or
 * a target entered by hand, and the default for each room use.
 */
import { z } from "zod";
import type { RoomUse } from "@/lib/room-uses";
import { DIN_GROUPS } from "./din-18041";
import { octaveRecordSchema } from "./octaves";

export const COMMON_PRACTICE_USES = ["office", "open-plan", "restaurant"] as const;

const kinds = '"din-18041", "ansi-s12-60", "common-practice" or "manual"';

export const targetSpecSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({
      kind: z.literal("din-18041"),
      group: z.enum(DIN_GROUPS, { error: `must be one of ${DIN_GROUPS.map((g) => `"${g}"`).join(", ")}` }),
    }),
    z.strictObject({ kind: z.literal("ansi-s12-60") }),
    z.strictObject({
      kind: z.literal("common-practice"),
      use: z.enum(COMMON_PRACTICE_USES, { error: 'must be one of "office", "open-plan", "restaurant"' }),
    }),
    z.strictObject({
      kind: z.literal("manual"),
      // A typed reverberation time above 20 s is a slip of the keyboard, not a room.
      seconds: octaveRecordSchema("reverberation time in s", 0, 20, { positive: true }),
    }),
  ],
  { error: `must be one of ${kinds}` },
);

export type TargetSpec = z.infer<typeof targetSpecSchema>;

/** Default target per room use; null for "other": the consultant enters one by hand. */
export const DEFAULT_TARGETS: Record<RoomUse, TargetSpec | null> = {
  music: { kind: "din-18041", group: "A1" },
  speech: { kind: "din-18041", group: "A2" },
  teaching: { kind: "din-18041", group: "A3" },
  sport: { kind: "din-18041", group: "A5" },
  office: { kind: "common-practice", use: "office" },
  dining: { kind: "common-practice", use: "restaurant" },
  other: null,
};

export function defaultTargetSpec(use: RoomUse): TargetSpec | null {
  return DEFAULT_TARGETS[use];
}
