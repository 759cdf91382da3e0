/**
 * One zod schema per input of the calculation contract (docs/contract.md), shared by the
 * command line and the HTTP API. Physical consistency (holes smaller than their pitch, open
 * area in (0, 1), infill no thicker than the cavity, …) is checked here so that both surfaces
 * refuse the same inputs with the same messages.
 */
import { z } from "zod";
import { ISO_354_LABELS, OCTAVE_LABELS } from "../bands";
import { LIMITS, airSchema, alpha, atmosphereSchema, between, boundedList, number, oneOf, positive, practical } from "./fields";

const ignored = () => z.number().nullable().optional();

const holeFacing = (kind: "round-holes" | "micro-perforated") =>
  z.strictObject({
    kind: z.literal(kind),
    thickness: practical(LIMITS.facingThickness),
    holeDiameter: practical(LIMITS.holeDiameter),
    pitch: practical(LIMITS.pitch),
    grid: oneOf(["square", "staggered"]),
    slotWidth: ignored(),
    slotPitch: ignored(),
  });

const slotFacing = z.strictObject({
  kind: z.literal("slots"),
  thickness: practical(LIMITS.facingThickness),
  slotWidth: practical(LIMITS.slotWidth),
  slotPitch: practical(LIMITS.slotPitch),
  holeDiameter: ignored(),
  pitch: ignored(),
  grid: z.string().nullable().optional(),
});

const facingSchema = z.discriminatedUnion("kind", [holeFacing("round-holes"), holeFacing("micro-perforated"), slotFacing], {
  error: 'must be one of "round-holes", "slots", "micro-perforated"',
});

const infillSchema = z
  .strictObject({
    thickness: practical(LIMITS.infillThickness),
    flowResistivity: practical(LIMITS.flowResistivity),
    position: oneOf(["behind-facing", "on-backing"]),
    model: oneOf(["delany-bazley", "miki"]),
  })
  .nullable();

export const evaluateInputSchema = z
  .strictObject({
    facing: facingSchema,
    cavity: z.strictObject({
      depth: practical(LIMITS.cavityDepth),
      partitioned: z.boolean({ error: "required: true for a partitioned (honeycomb) cavity, false for an open one" }),
    }),
    infill: infillSchema.optional().default(null),
    air: airSchema,
  })
  .superRefine((input, ctx) => {
    const { facing, cavity, infill } = input;
    if (facing.kind === "slots") {
      const openArea = facing.slotWidth / facing.slotPitch;
      if (openArea >= 1) {
        ctx.addIssue({
          code: "custom",
          path: ["facing", "slotWidth"],
          message: `open area slotWidth/slotPitch = ${openArea.toPrecision(3)} must lie between 0 and 1: the slot width must be smaller than the slot pitch (${facing.slotPitch} m)`,
        });
      }
    } else if (facing.holeDiameter >= facing.pitch) {
      ctx.addIssue({
        code: "custom",
        path: ["facing", "holeDiameter"],
        message: `hole diameter ${facing.holeDiameter} m must be smaller than the pitch ${facing.pitch} m: the holes would overlap`,
      });
    }
    if (infill && infill.thickness > cavity.depth) {
      ctx.addIssue({
        code: "custom",
        path: ["infill", "thickness"],
        message: `infill thickness ${infill.thickness} m is more than the cavity depth ${cavity.depth} m: the cavity must be at least as deep as its infill`,
      });
    }
  });

export const rateInputSchema = z.strictObject({
  thirdOctaves: z.strictObject(Object.fromEntries(ISO_354_LABELS.map((label) => [String(label), alpha()]))),
});

export const resonatorInputSchema = z
  .strictObject({
    neckArea: practical(LIMITS.neckArea),
    neckLength: between("m", 0, 10),
    volume: practical(LIMITS.resonatorVolume),
    neckRadius: practical(LIMITS.neckRadius).optional(),
    ends: oneOf(["flanged-flanged", "flanged-free", "none"]),
    air: airSchema,
  })
  .superRefine((input, ctx) => {
    if (input.ends === "none" && input.neckLength === 0) {
      ctx.addIssue({
        code: "custom",
        path: ["neckLength"],
        message: 'must be greater than 0 m when ends is "none": the neck would have no length at all',
      });
    }
  });

/**
 * A room's surfaces, openings and furnishings: a detailed model has a few hundred; more is not a
 * room but a flood, refused before any of it is read.
 */
export const MAX_SURFACES = 2000;

const octaveAlpha = z.strictObject(
  Object.fromEntries(OCTAVE_LABELS.map((label) => [String(label), label === 63 ? alpha().optional() : alpha()])),
);

export const reverbInputSchema = z
  .strictObject({
    volume: practical(LIMITS.roomVolume),
    surfaces: boundedList(z.strictObject({ area: positive("m²", 1e6), alpha: octaveAlpha }), {
      min: 1,
      max: MAX_SURFACES,
      what: "surfaces with area and alpha",
      tooFew: "must list at least one surface",
    }),
    air: atmosphereSchema,
    method: oneOf(["sabine", "eyring"]),
  })
  .superRefine((input, ctx) => {
    const with63 = input.surfaces.filter((s) => s.alpha["63"] !== undefined).length;
    if (with63 > 0 && with63 < input.surfaces.length) {
      input.surfaces.forEach((s, i) => {
        if (s.alpha["63"] === undefined) {
          ctx.addIssue({
            code: "custom",
            path: ["surfaces", i, "alpha", "63"],
            message: "required here: give the 63 Hz coefficient for every surface or for none",
          });
        }
      });
    }
    if (input.method !== "eyring") return;
    const total = input.surfaces.reduce((sum, s) => sum + s.area, 0);
    for (const label of OCTAVE_LABELS) {
      const key = String(label);
      if (input.surfaces.some((s) => s.alpha[key] === undefined)) continue;
      const mean = input.surfaces.reduce((sum, s) => sum + s.area * (s.alpha[key] as number), 0) / total;
      if (mean >= 1) {
        ctx.addIssue({
          code: "custom",
          path: ["surfaces"],
          message: `Eyring's formula needs a mean absorption coefficient below 1; at ${label} Hz it is ${mean.toFixed(3)}`,
        });
      }
    }
  });

export const airInputSchema = z.strictObject({
  f: positive("Hz", 100_000),
  temperature: atmosphereSchema.shape.temperature,
  humidity: atmosphereSchema.shape.humidity,
  pressure: atmosphereSchema.shape.pressure,
});

export type EvaluateInput = z.infer<typeof evaluateInputSchema>;
export type RateInput = z.infer<typeof rateInputSchema>;
export type ResonatorInput = z.infer<typeof resonatorInputSchema>;
export type ReverbInput = z.infer<typeof reverbInputSchema>;
export type AirInput = z.infer<typeof airInputSchema>;
