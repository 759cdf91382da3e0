import { z } from "zod";
import { evaluateInputSchema } from "@/lib/acoustics/contract";
import { formatLength, type LengthScale, type UnitPreference } from "@/lib/units";
import { nameField } from "./common";
import { lengthField, lengthRefusal, type LengthLimits } from "./lengths";

export const FIRE_STANDARDS = ["EN 13501-1", "ASTM E84", "other", "none"] as const;

// The sizes a build-up may have, with the reasons (common practice; the upper bounds are the
// calculation contract's, which catch metres typed for millimetres).
export const BUILD_UP_LIMITS = {
  thickness: { min: 0, above: true, max: 0.1, why: "a perforated facing is a sheet or board up to 100 mm thick" },
  hole: { min: 0, above: true, max: 0.1, why: "a hole is drilled or punched through the facing, up to 100 mm across" },
  pitch: { min: 0, above: true, max: 0.5, why: "holes or slots repeat at most every 500 mm across a panel" },
  cavity: { min: 0, above: true, max: 2, why: "the air gap behind a panel is at most 2 m deep" },
  infill: { min: 0, above: true, max: 2, why: "a porous layer lies within the cavity, at most 2 m deep" },
  module: { min: 0.1, max: 3.6, why: "panels are cut from sheets up to 3.6 m long, and one under 100 mm is a strip" },
  border: { min: 0, max: 0.5, why: "an unperforated border is at most 500 mm wide" },
} satisfies Record<string, LengthLimits>;
/** Pa·s/m²: the contract's bound; mineral wool and fibre boards lie between about 2 000 and 100 000. */
export const FLOW_RESISTIVITY_MAX = 1e7;

type Spec = Record<string, unknown> & { facing?: Record<string, unknown>; cavity?: Record<string, unknown>; infill?: Record<string, unknown> | null };

// The build-up's lengths checked in the person's units, before the contract's own schema (in
// SI units, shared with the command line) checks the rest. Only numbers are looked at here;
// what is missing or of the wrong kind is left to the contract.
function specInUnits(units: UnitPreference) {
  return (raw: unknown, ctx: z.RefinementCtx) => {
    if (typeof raw !== "object" || raw === null) return;
    const spec = raw as Spec;
    const check = (path: string[], what: string, limits: LengthLimits, scale: LengthScale) => {
      const v = path.reduce<unknown>((o, key) => (o && typeof o === "object" ? (o as Record<string, unknown>)[key] : undefined), spec);
      if (typeof v !== "number") return true;
      const message = lengthRefusal(what, v, limits, (m) => formatLength(m, units, { scale }));
      if (message) ctx.addIssue({ code: "custom", path, message });
      return !message;
    };
    const say = (m: number) => formatLength(m, units, { scale: "fine" });
    const f = spec.facing ?? {};
    check(["facing", "thickness"], "plate thickness", BUILD_UP_LIMITS.thickness, "fine");
    if (f.kind === "slots") {
      const ok = check(["facing", "slotWidth"], "slot width", BUILD_UP_LIMITS.hole, "fine") && check(["facing", "slotPitch"], "slot pitch", BUILD_UP_LIMITS.pitch, "fine");
      if (ok && typeof f.slotWidth === "number" && typeof f.slotPitch === "number" && f.slotWidth >= f.slotPitch) {
        ctx.addIssue({ code: "custom", path: ["facing", "slotWidth"], message: `The slot width (${say(f.slotWidth)}) must be less than the slot pitch (${say(f.slotPitch)}): the slots would leave no facing between them.` });
      }
    } else {
      const ok = check(["facing", "holeDiameter"], "hole diameter", BUILD_UP_LIMITS.hole, "fine") && check(["facing", "pitch"], "pitch", BUILD_UP_LIMITS.pitch, "fine");
      if (ok && typeof f.holeDiameter === "number" && typeof f.pitch === "number" && f.holeDiameter >= f.pitch) {
        ctx.addIssue({ code: "custom", path: ["facing", "holeDiameter"], message: `The hole diameter (${say(f.holeDiameter)}) must be less than the pitch (${say(f.pitch)}): the holes would overlap.` });
      }
    }
    const cavityOk = check(["cavity", "depth"], "cavity depth", BUILD_UP_LIMITS.cavity, "panel");
    const infill = spec.infill;
    if (infill && typeof infill === "object") {
      const ok = check(["infill", "thickness"], "infill thickness", BUILD_UP_LIMITS.infill, "panel");
      const depth = spec.cavity?.depth;
      if (ok && cavityOk && typeof infill.thickness === "number" && typeof depth === "number" && infill.thickness > depth) {
        const panel = (m: number) => formatLength(m, units, { scale: "panel" });
        ctx.addIssue({ code: "custom", path: ["infill", "thickness"], message: `The infill (${panel(infill.thickness)}) is thicker than the cavity (${panel(depth)}): it must fit in the air gap.` });
      }
      const r = infill.flowResistivity;
      if (typeof r === "number" && Number.isFinite(r) && (r <= 0 || r > FLOW_RESISTIVITY_MAX)) {
        ctx.addIssue({
          code: "custom",
          path: ["infill", "flowResistivity"],
          message: `The flow resistivity must be more than 0 and at most ${FLOW_RESISTIVITY_MAX} Pa·s/m² (${r} was given); mineral wool and fibre boards lie between about 2000 and 100000.`,
        });
      }
    }
  };
}

function bordersFit(v: { moduleWidth: number; moduleHeight: number; borderX: number; borderY: number }, ctx: z.RefinementCtx) {
  if (2 * v.borderX >= v.moduleWidth) ctx.addIssue({ code: "custom", path: ["borderX"], message: "The side borders leave no perforated width on the module." });
  if (2 * v.borderY >= v.moduleHeight) ctx.addIssue({ code: "custom", path: ["borderY"], message: "The top and bottom borders leave no perforated height on the module." });
}

/**
 * A panel build-up of a project's library, with messages in the person's units. `spec` is the
 * calculation contract's evaluate input, so the engine refuses exactly what the command line
 * would, and the field is named the same.
 */
export function buildUpSchemas(units: UnitPreference = "metric") {
  const size = (what: string, limits: LengthLimits) => lengthField(what, limits, units, "panel");
  const spec = z.unknown().superRefine(specInUnits(units)).pipe(evaluateInputSchema);
  const fields = z.object({
    name: nameField,
    spec,
    moduleWidth: size("module width", BUILD_UP_LIMITS.module),
    moduleHeight: size("module height", BUILD_UP_LIMITS.module),
    borderX: size("side border", BUILD_UP_LIMITS.border),
    borderY: size("top and bottom border", BUILD_UP_LIMITS.border),
    facingMaterial: z.string().trim().max(200, { error: "Keep the facing material under 200 characters." }).default(""),
    fireStandard: z.enum(FIRE_STANDARDS, { error: "Choose EN 13501-1, ASTM E84, other or none." }).default("none"),
    fireClass: z.string().trim().max(40, { error: "Keep the class under 40 characters, e.g. B-s1,d0 or Class A." }).default(""),
    fireReportId: z.string().max(64).nullable().default(null),
    notes: z.string().trim().max(2000, { error: "Keep the notes under 2000 characters." }).default(""),
  });
  return {
    spec,
    fields,
    create: fields.superRefine(bordersFit),
    update: fields.extend({ version: z.number({ error: "Send the version you edited." }).int().positive() }).superRefine(bordersFit),
  };
}

const metric = buildUpSchemas("metric");
export const buildUpFieldsSchema = metric.fields;
export const createBuildUpSchema = metric.create;
export const updateBuildUpSchema = metric.update;

export type BuildUpFields = z.infer<typeof buildUpFieldsSchema>;
