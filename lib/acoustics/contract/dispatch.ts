/**
 * Run a command on unknown JSON: parse, calculate, and return the result only when every
 * number in it is finite. Used by the command line and the HTTP routes alike.
 */
import { nonFiniteErrors } from "./finite";
import { type ContractCommand, type ContractInput, type FieldError, parseContractInput } from "./parse";
import { runAir, runEvaluate, runRate, runResonator, runReverb } from "./run";

export type ContractResult = { ok: true; output: unknown } | { ok: false; errors: FieldError[] };

const RUNNERS: { [C in ContractCommand]: (input: ContractInput<C>) => unknown } = {
  evaluate: runEvaluate,
  rate: runRate,
  resonator: runResonator,
  reverb: runReverb,
  air: runAir,
};

function run<C extends ContractCommand>(command: C, value: ContractInput<C>): unknown {
  return RUNNERS[command](value);
}

export function runContract(command: string, json: unknown): ContractResult {
  const parsed = parseContractInput(command, json);
  if (!parsed.ok) return parsed;
  const output = run(command as ContractCommand, parsed.value as never);
  const errors = nonFiniteErrors(output);
  return errors.length ? { ok: false, errors } : { ok: true, output };
}
