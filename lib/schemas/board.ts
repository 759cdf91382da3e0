import { z } from "zod";
import { formatLength, type UnitPreference } from "@/lib/units";
import { lengthField, type LengthLimits } from "./lengths";

// Plausible panels (common practice; our judgement). A panel narrower than 20 mm cannot be
// made or fixed; no resonant panel is larger than the 300 m surface a room can have. Where a
// panel may lie depends on its surface, so boardSchemas takes the surface.
export const PANEL_LIMITS = {
  size: { min: 0.02, max: 300, why: "a panel narrower than 20 mm cannot be made or fixed, and none is larger than a room's surface" },
  position: { min: -300, max: 300, why: "it is measured from the surface's lower-left corner" },
} satisfies Record<string, LengthLimits>;
/** A pin's comment, in characters: a review note, not a report. */
export const COMMENT_MAX = 2000;

/** The surface a board belongs to, m. */
export type BoardExtent = { name?: string; width: number; height: number };
/** Float noise allowed when a panel fills its surface exactly, m (a micrometre). */
const SLACK = 1e-6;

const finite = (what: string) => z.number({ error: `Enter the ${what} as a length.` }).refine(Number.isFinite, { error: `Enter the ${what} as a number.` });

export function boardSchemas(units: UnitPreference = "metric", surface: BoardExtent | null = null) {
  const say = (m: number) => formatLength(m, units);
  const placement = z.object({
    id: z.string().min(1).max(64),
    buildUpId: z.string().min(1, { error: "Choose a build-up." }),
    code: z.string().trim().min(1, { error: "Give the panel a code, like P-001." }).max(20, { error: "Keep the panel's code under 20 characters." }),
    // With its surface known, where a panel may lie is checked against it (withinSurface).
    x: surface ? finite("position from the left") : lengthField("position from the left", PANEL_LIMITS.position, units),
    y: surface ? finite("height above the datum") : lengthField("height above the datum", PANEL_LIMITS.position, units),
    width: lengthField("panel's width", PANEL_LIMITS.size, units, "panel"),
    height: lengthField("panel's height", PANEL_LIMITS.size, units, "panel"),
  });
  const where = surface?.name ? `${surface.name} (${say(surface.width)} × ${say(surface.height)})` : "the surface";

  // A panel can be no larger than its surface; while a layout is worked out it may be parked
  // beside the surface (the board flags it as outside), but no farther away than the surface's
  // own width or height.
  function withinSurface(p: z.infer<typeof placement>, i: number, ctx: z.RefinementCtx) {
    if (!surface) return;
    const axes = [
      { size: "width", pos: "x", extent: surface.width, along: "wide", side: "to the left or right of" },
      { size: "height", pos: "y", extent: surface.height, along: "high", side: "below or above" },
    ] as const;
    for (const a of axes) {
      const size = p[a.size];
      const pos = p[a.pos];
      if (size > a.extent + SLACK) {
        ctx.addIssue({ code: "custom", path: ["placements", i, a.size], message: `A panel ${say(size)} ${a.along} is larger than ${where}: it can be at most ${say(a.extent)}.` });
      } else if (pos < -a.extent - SLACK || pos + size > 2 * a.extent + SLACK) {
        ctx.addIssue({
          code: "custom",
          path: ["placements", i, a.pos],
          message: `${p.code} at ${a.pos} = ${say(pos)} lies too far from ${where}: a panel may be parked ${a.side} the surface, but no farther than ${say(a.extent)} from it.`,
        });
      }
    }
  }

  const save = z
    .object({
      version: z.number({ error: "Send the version you edited." }).int().min(0),
      gridModule: lengthField("grid module", { min: 0.01, max: 5, why: "a setting-out grid runs from 10 mm to 5 m" }, units, "panel").default(0.3),
      placements: z.array(placement).max(3000, { error: "At most 3000 panels on one board." }),
    })
    .superRefine((v, ctx) => v.placements.forEach((p, i) => withinSurface(p, i, ctx)));

  const onSurface = (axis: "x" | "y") =>
    z.number({ error: "Place the pin on the board." }).superRefine((v, ctx) => {
      const extent = surface ? (axis === "x" ? surface.width : surface.height) : Infinity;
      if (!Number.isFinite(v)) ctx.addIssue({ code: "custom", message: "Place the pin on the board." });
      else if (v < -SLACK || v > extent + SLACK) ctx.addIssue({ code: "custom", message: `Place the pin on ${where}: ${axis} = ${say(v)} is off it.` });
    });
  const pin = z.object({
    x: onSurface("x"),
    y: onSurface("y"),
    body: z
      .string({ error: "Write the comment." })
      .trim()
      .min(1, { error: "Write the comment: a pin needs something to say." })
      .max(COMMENT_MAX, { error: `Keep the comment to ${COMMENT_MAX} characters; attach longer notes to the project.` }),
  });
  return { placement, save, pin };
}

const metric = boardSchemas("metric");
export const placementInputSchema = metric.placement;
export const saveBoardSchema = metric.save;
export const pinInputSchema = metric.pin;

export const drawingSchema = z.object({
  attachmentId: z.string().min(1).nullable(),
  x: z.number().refine(Number.isFinite).default(0),
  y: z.number().refine(Number.isFinite).default(0),
  metresPerPixel: z.number().refine((v) => v > 0 && v < 10, { error: "The drawing's scale must be positive: pick two points and give their distance." }).default(0.01),
  opacity: z.number().min(0, { error: "Opacity runs from 0 to 1." }).max(1, { error: "Opacity runs from 0 to 1." }).default(0.5),
});

export const replyInputSchema = z.object({
  body: z
    .string({ error: "Write the reply." })
    .trim()
    .min(1, { error: "Write the reply." })
    .max(COMMENT_MAX, { error: `Keep the reply to ${COMMENT_MAX} characters; attach longer notes to the project.` }),
});

export type SaveBoardInput = z.infer<typeof saveBoardSchema>;
export type PlacementInput = z.infer<typeof placementInputSchema>;

export const resolveInputSchema = z.object({
  resolved: z.boolean({ error: "Say whether the pin is resolved (true) or open again (false)." }).default(true),
});
