import { z } from "zod";

const metres = (what: string) =>
  z.number({ error: `Enter the ${what} in metres.` }).refine(Number.isFinite, { error: `Enter the ${what} as a number.` });

export const placementInputSchema = z.object({
  id: z.string().min(1).max(64),
  buildUpId: z.string().min(1, { error: "Choose a build-up." }),
  code: z.string().trim().min(1, { error: "Give the panel a code, like P-001." }).max(20),
  x: metres("position from the left"),
  y: metres("height above the datum"),
  width: metres("width").refine((v) => v >= 0.02, { error: "A panel must be at least 20 mm wide." }),
  height: metres("height").refine((v) => v >= 0.02, { error: "A panel must be at least 20 mm high." }),
});

export const saveBoardSchema = z.object({
  version: z.number({ error: "Send the version you edited." }).int().min(0),
  gridModule: z.number().refine((v) => v >= 0.01 && v <= 5, { error: "The grid module must be between 10 mm and 5 m." }).default(0.3),
  placements: z.array(placementInputSchema).max(3000, { error: "At most 3000 panels on one board." }),
});

export const drawingSchema = z.object({
  attachmentId: z.string().min(1).nullable(),
  x: z.number().refine(Number.isFinite).default(0),
  y: z.number().refine(Number.isFinite).default(0),
  metresPerPixel: z.number().refine((v) => v > 0 && v < 10, { error: "The drawing's scale must be positive: pick two points and give their distance." }).default(0.01),
  opacity: z.number().min(0, { error: "Opacity runs from 0 to 1." }).max(1, { error: "Opacity runs from 0 to 1." }).default(0.5),
});

export const pinInputSchema = z.object({
  x: z.number().refine(Number.isFinite, { error: "Place the pin on the board." }),
  y: z.number().refine(Number.isFinite, { error: "Place the pin on the board." }),
  body: z.string().trim().min(1, { error: "Write the comment." }).max(2000, { error: "Keep the comment under 2000 characters." }),
});

export const replyInputSchema = z.object({
  body: z.string().trim().min(1, { error: "Write the reply." }).max(2000, { error: "Keep the reply under 2000 characters." }),
});

export type SaveBoardInput = z.infer<typeof saveBoardSchema>;
export type PlacementInput = z.infer<typeof placementInputSchema>;

export const resolveInputSchema = z.object({
  resolved: z.boolean({ error: "Say whether the pin is resolved (true) or open again (false)." }).default(true),
});
