/**
 * Cavitas's acoustics engine: pure TypeScript, no framework, no database. The contract
 * (inputs, outputs, units and the model variant behind each number) is documented in
 * docs/contract.md; each formula names its published source where it is implemented.
 */
export * from "./air";
export * from "./air-absorption";
export * from "./bands";
export * from "./build-up";
export * from "./cavity-cache";
export * from "./end-corrections";
export * from "./evaluate";
export * from "./facing-impedance";
export * from "./field-incidence";
export * from "./helmholtz";
export * from "./incidence";
export * from "./layered-model";
export * from "./perforation";
export * from "./porous";
export * from "./ratings";
export * from "./reverberation";
export * from "./spectrum";
export * from "./warnings";
export * from "./contract";
