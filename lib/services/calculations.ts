import { AppError } from "@/lib/errors";
import { runContract } from "@/lib/acoustics/contract";
import type { Actor } from "./actor";
import { requireActor } from "./guard";

// The calculation contract over HTTP (docs/contract.md): any signed-in user,
// the same zod schemas and the same finite-result check as the command line, and bad input
// answered 400 with the field named.
export type HttpCalculation = "evaluate" | "rate" | "reverb";

// The body is read only after the session check, so a stranger learns nothing from errors.
export async function calculate(actor: Actor | null, command: HttpCalculation, body: () => Promise<unknown>): Promise<unknown> {
  requireActor(actor);
  const result = runContract(command, await body());
  if (!result.ok) {
    throw new AppError(
      "bad_request",
      `The ${command} input is not valid: ${result.errors.map((e) => `${e.field || "(input)"}: ${e.message}`).join("; ")}`,
      result.errors.map((e) => ({ field: e.field || "(input)", message: e.message })),
    );
  }
  return result.output;
}
