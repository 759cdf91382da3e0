import { z } from "zod";
import { ROOM_USES } from "@/lib/room-uses";
import { OPENING_KINDS, SURFACE_KINDS } from "@/lib/rooms/geometry";
import { targetSpecSchema } from "@/lib/rooms/target-spec";
import { nameField } from "./common";

// The shape of a room as the editor sends it; what the numbers must satisfy (positive sizes,
// openings inside their surface, a volume that fits) is checked by lib/rooms/validation.ts.
const num = (what: string) => z.number({ error: `Enter the ${what} as a number.` }).refine(Number.isFinite, { error: `Enter the ${what} as a number.` });

export const openingInputSchema = z.object({
  kind: z.enum(OPENING_KINDS, { error: "Choose door, window, glazing, vent or other." }),
  name: z.string().trim().max(80, { error: "Keep the name under 80 characters." }).default(""),
  x: num("distance from the left"),
  y: num("height above the floor"),
  width: num("width"),
  height: num("height"),
  material: z.string().min(1, { error: "Choose a material." }),
});

export const surfaceInputSchema = z.object({
  key: z.string().trim().min(1).max(40),
  name: nameField,
  kind: z.enum(SURFACE_KINDS, { error: "Choose wall, ceiling or floor." }),
  width: num("width"),
  height: num("height"),
  finish: z.string().min(1, { error: "Choose a finish." }),
  openings: z.array(openingInputSchema).max(60, { error: "At most 60 openings on one surface." }).default([]),
});

export const treatmentInputSchema = z.object({
  surfaceKey: z.string().min(1, { error: "Choose a surface." }),
  buildUpId: z.string().min(1, { error: "Choose a build-up." }),
  area: num("treated area"),
});

const roomFields = {
  name: nameField,
  use: z.enum(ROOM_USES, { error: "Choose the room's use." }),
  shape: z.enum(["shoebox", "free"], { error: "Choose a shoebox or a volume with surfaces." }),
  length: num("length").nullable().default(null),
  width: num("width").nullable().default(null),
  height: num("height").nullable().default(null),
  volume: num("volume").nullable().default(null),
  temperature: num("air temperature").default(20),
  humidity: num("relative humidity").default(50),
  pressure: num("air pressure").default(101325),
  target: targetSpecSchema.nullable().default(null),
  surfaces: z.array(surfaceInputSchema).max(40, { error: "At most 40 surfaces in one room." }).default([]),
  treatments: z.array(treatmentInputSchema).max(200).default([]),
};

export const createRoomSchema = z.object(roomFields);
export const updateRoomSchema = z.object({ ...roomFields, version: z.number({ error: "Send the version you edited." }).int().positive() });

export type RoomFields = z.infer<typeof createRoomSchema>;
