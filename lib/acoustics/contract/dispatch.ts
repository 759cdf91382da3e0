/** Run a command on unknown JSON: parse, then calculate. Used by the command line. */
import { type ContractCommand, type ContractInput, type FieldError, parseContractInput } from "./parse";
import { runAir, runEvaluate, runRate, runResonator, runReverb } from "./run";

export type ContractResult = { ok: true; output: unknown } | { ok: false; errors: FieldError[] };

function run<C extends ContractCommand>(command: C, json: unknown, calculate: (input: ContractInput<C>) => unknown): ContractResult {
  const parsed = parseContractInput(command, json);
  return parsed.ok ? { ok: true, output: calculate(parsed.value) } : parsed;
}

export function runContract(command: string, json: unknown): ContractResult {
  switch (command) {
    case "evaluate":
      return run(command, json, runEvaluate);
    case "rate":
      return run(command, json, runRate);
    case "resonator":
      return run(command, json, runResonator);
    case "reverb":
      return run(command, json, runReverb);
    case "air":
      return run(command, json, runAir);
    default: {
      const parsed = parseContractInput(command, json);
      return parsed.ok ? { ok: false, errors: [] } : parsed;
    }
  }
}
