/**
 * One entry point for both surfaces: parse unknown JSON for a command and report every problem
 * as { field: "facing.holeDiameter", message } with the field as a dotted path.
 */
import type { z } from "zod";
import { airInputSchema, evaluateInputSchema, rateInputSchema, resonatorInputSchema, reverbInputSchema } from "./schemas";

export const contractSchemas = {
  evaluate: evaluateInputSchema,
  rate: rateInputSchema,
  resonator: resonatorInputSchema,
  reverb: reverbInputSchema,
  air: airInputSchema,
} as const;

export type ContractCommand = keyof typeof contractSchemas;
export type ContractInput<C extends ContractCommand> = z.output<(typeof contractSchemas)[C]>;

export interface FieldError {
  /** dotted path of the field, "" for the input as a whole */
  field: string;
  message: string;
}

export type ParseResult<T> = { ok: true; value: T } | { ok: false; errors: FieldError[] };

export const CONTRACT_COMMANDS = Object.keys(contractSchemas) as ContractCommand[];

export function isContractCommand(command: string): command is ContractCommand {
  return Object.hasOwn(contractSchemas, command);
}

/** zod issues as field errors; an unknown key becomes an error on that key. */
export function fieldErrors(issues: readonly z.core.$ZodIssue[]): FieldError[] {
  return issues.flatMap((issue) => {
    const base = issue.path.map(String);
    if (issue.code === "unrecognized_keys") {
      return issue.keys.map((key) => ({ field: [...base, key].join("."), message: "unknown field" }));
    }
    return [{ field: base.join("."), message: issue.message }];
  });
}

export function parseContractInput<C extends ContractCommand>(command: C, json: unknown): ParseResult<ContractInput<C>>;
export function parseContractInput(command: string, json: unknown): ParseResult<unknown>;
export function parseContractInput(command: string, json: unknown): ParseResult<unknown> {
  if (!isContractCommand(command)) {
    return { ok: false, errors: [{ field: "", message: `unknown command "${command}": use one of ${CONTRACT_COMMANDS.join(", ")}` }] };
  }
  const result = contractSchemas[command].safeParse(json);
  return result.success ? { ok: true, value: result.data } : { ok: false, errors: fieldErrors(result.error.issues) };
}
