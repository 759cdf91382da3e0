import { z } from "zod";
import { ROOM_USES } from "@/lib/room-uses";
import { OPENING_KINDS, SURFACE_KINDS } from "@/lib/rooms/geometry";
import { targetSpecSchema } from "@/lib/rooms/target-spec";
import { sayIn, type UnitPreference } from "@/lib/units";
import { nameField } from "./common";
import { lengthField, type LengthLimits } from "./lengths";

// The shape of a room as the editor, the API and the seed send it, with the sizes a
// practitioner would accept. What the numbers must satisfy together (openings inside their
// surface, a volume that fits its surfaces, the air) is checked by lib/rooms/validation.ts.
const num = (what: string) => z.number({ error: `Enter the ${what} as a number.` }).refine(Number.isFinite, { error: `Enter the ${what} as a number.` });

// Plausible sizes (common practice; our judgement, not a standard). Cavitas models enclosed
// rooms from a vocal booth (about 1 m a side) to a covered arena (about 300 m long, 100 m
// high); Sabine's and Eyring's formulas assume a diffuse sound field, which nothing larger has.
const ROOM_SCALE = "Cavitas models rooms from a vocal booth to a covered arena";
export const ROOM_LIMITS = {
  side: { min: 1, max: 300, why: `${ROOM_SCALE} (1 m to 300 m)` },
  height: { min: 1, max: 100, why: `${ROOM_SCALE} (1 m to 100 m high)` },
  surface: { min: 0, above: true, max: 300, why: "a room's surface is no larger than a covered arena's (300 m)" },
  opening: { min: 0, above: true, max: 300, why: "an opening lies on one surface of the room (300 m at most)" },
  position: { min: 0, max: 300, why: "it is measured from the surface's lower-left corner, on the surface" },
} satisfies Record<string, LengthLimits>;
/** m³: the calculation contract's reverberation limit; a bigger space is outdoors in all but name. */
export const VOLUME_LIMITS = { min: 1, max: 1_000_000 };
/** m²: at most a 300 m × 300 m surface. */
export const TREATED_AREA_MAX = 90_000;


/** The room's schemas with messages in the person's units (the same limits for everyone). */
export function roomSchemas(units: UnitPreference = "metric") {
  const length = (what: string, limits: LengthLimits) => lengthField(what, limits, units, "room");
  const say = sayIn(units);
  const opening = z.object({
    kind: z.enum(OPENING_KINDS, { error: "Choose door, window, glazing, vent or other." }),
    name: z.string().trim().max(80, { error: "Keep the name under 80 characters." }).default(""),
    x: length("distance from the left", ROOM_LIMITS.position),
    y: length("height above the floor", ROOM_LIMITS.position),
    width: length("width of the opening", ROOM_LIMITS.opening),
    height: length("height of the opening", ROOM_LIMITS.opening),
    material: z.string().min(1, { error: "Choose a material." }),
  });
  const surface = z.object({
    key: z.string().trim().min(1).max(40),
    name: nameField,
    kind: z.enum(SURFACE_KINDS, { error: "Choose wall, ceiling or floor." }),
    width: length("width of the surface", ROOM_LIMITS.surface),
    height: length("height of the surface", ROOM_LIMITS.surface),
    finish: z.string().min(1, { error: "Choose a finish." }),
    openings: z.array(opening).max(60, { error: "At most 60 openings on one surface." }).default([]),
  });
  const treatment = z.object({
    surfaceKey: z.string().min(1, { error: "Choose a surface." }),
    buildUpId: z.string().min(1, { error: "Choose a build-up." }),
    area: num("treated area").superRefine((v, ctx) => {
      if (v <= 0) ctx.addIssue({ code: "custom", message: `The treated area must be more than ${say.area(0)}${v < 0 ? ": it cannot be negative" : ""}.` });
      else if (v > TREATED_AREA_MAX) ctx.addIssue({ code: "custom", message: `The treated area must be at most ${say.area(TREATED_AREA_MAX)}, a 300 m × 300 m surface (${say.area(v)} was given).` });
    }),
  });
  const volume = num("volume").superRefine((v, ctx) => {
    if (v < VOLUME_LIMITS.min || v > VOLUME_LIMITS.max) {
      ctx.addIssue({
        code: "custom",
        message: `The volume must be between ${say.volume(VOLUME_LIMITS.min)} and ${say.volume(VOLUME_LIMITS.max)} (${say.volume(v)} was given): ${ROOM_SCALE}.`,
      });
    }
  });
  const fields = {
    name: nameField,
    use: z.enum(ROOM_USES, { error: "Choose the room's use." }),
    shape: z.enum(["shoebox", "free"], { error: "Choose a shoebox or a volume with surfaces." }),
    length: length("length", ROOM_LIMITS.side).nullable().default(null),
    width: length("width", ROOM_LIMITS.side).nullable().default(null),
    height: length("height", ROOM_LIMITS.height).nullable().default(null),
    volume: volume.nullable().default(null),
    temperature: num("air temperature").default(20),
    humidity: num("relative humidity").default(50),
    pressure: num("air pressure").default(101325),
    target: targetSpecSchema.nullable().default(null),
    surfaces: z.array(surface).max(40, { error: "At most 40 surfaces in one room." }).default([]),
    treatments: z.array(treatment).max(200).default([]),
  };
  // A shoebox has no volume box of its own: its length carries the refusal.
  const shoeboxVolume = (v: { shape: string; length: number | null; width: number | null; height: number | null }, ctx: z.RefinementCtx) => {
    if (v.shape !== "shoebox" || v.length === null || v.width === null || v.height === null) return;
    const m3 = v.length * v.width * v.height;
    if (m3 > VOLUME_LIMITS.max) {
      ctx.addIssue({
        code: "custom",
        path: ["length"],
        message: `This room would hold ${say.volume(m3)}, more than ${say.volume(VOLUME_LIMITS.max)}: ${ROOM_SCALE}. Check the length, width and height.`,
      });
    }
  };
  return {
    opening,
    surface,
    treatment,
    create: z.object(fields).superRefine(shoeboxVolume),
    update: z.object({ ...fields, version: z.number({ error: "Send the version you edited." }).int().positive() }).superRefine(shoeboxVolume),
  };
}

const metric = roomSchemas("metric");
export const openingInputSchema = metric.opening;
export const surfaceInputSchema = metric.surface;
export const treatmentInputSchema = metric.treatment;
export const createRoomSchema = metric.create;
export const updateRoomSchema = metric.update;

export type RoomFields = z.infer<typeof createRoomSchema>;
