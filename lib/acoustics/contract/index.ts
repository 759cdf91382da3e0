/** The calculation contract (docs/contract.md): schemas, parsing and the five calculations. */
export {
  airInputSchema,
  evaluateInputSchema,
  rateInputSchema,
  resonatorInputSchema,
  reverbInputSchema,
  type AirInput,
  type EvaluateInput,
  type RateInput,
  type ResonatorInput,
  type ReverbInput,
} from "./schemas";
export {
  CONTRACT_COMMANDS,
  contractSchemas,
  fieldErrors,
  isContractCommand,
  parseContractInput,
  type ContractCommand,
  type ContractInput,
  type FieldError,
  type ParseResult,
} from "./parse";
export { runAir, runEvaluate, runRate, runResonator, runReverb, toBuildUp, type EvaluateOutput } from "./run";
export { runContract, type ContractResult } from "./dispatch";
export { nonFiniteErrors, nonFinitePaths } from "./finite";
export { LIMITS, type Limit } from "./fields";
export { MAX_SURFACES } from "./schemas";
