import { AppError } from "@/lib/errors";
import { parseContractInput, runEvaluate, runRate, runReverb } from "@/lib/acoustics/contract";
import type { Actor } from "./actor";
import { requireActor } from "./guard";

// The calculation contract over HTTP (product specification, section 6): any signed-in user,
// the same zod schemas as the command line, and bad input answered 400 with the field named.
const RUNNERS = {
  evaluate: (v: unknown) => runEvaluate(v as Parameters<typeof runEvaluate>[0]),
  rate: (v: unknown) => runRate(v as Parameters<typeof runRate>[0]),
  reverb: (v: unknown) => runReverb(v as Parameters<typeof runReverb>[0]),
} as const;

export type HttpCalculation = keyof typeof RUNNERS;

// The body is read only after the session check, so a stranger learns nothing from errors.
export async function calculate(actor: Actor | null, command: HttpCalculation, body: () => Promise<unknown>): Promise<unknown> {
  requireActor(actor);
  const parsed = parseContractInput(command, await body());
  if (!parsed.ok) {
    throw new AppError(
      "bad_request",
      `The ${command} input is not valid: ${parsed.errors.map((e) => `${e.field || "(input)"}: ${e.message}`).join("; ")}`,
      parsed.errors.map((e) => ({ field: e.field || "(input)", message: e.message })),
    );
  }
  return RUNNERS[command](parsed.value);
}
