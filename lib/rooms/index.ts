/**
 * The rooms domain: materials, geometry, targets and the reverberation check. Pure TypeScript
 * and zod; the numbers come from lib/acoustics.
 */
export * from "./assemble";
export * from "./check";
export * from "./check-input";
export * from "./din-18041";
export * from "./geometry";
export { type Issue, hasErrors } from "./issues";
export * from "./materials-library";
export * from "./octaves";
export * from "./panel-area";
export * from "./target-spec";
export * from "./targets";
export * from "./validation";
