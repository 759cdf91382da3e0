/**
 * Cavitas's acoustics engine: pure TypeScript, no framework, no database. The README's
 * "Calculation contract" section documents the contract; REFERENCES.md section 0 fixes the
 * model variants implemented here.
 */
export * from "./air";
export * from "./air-absorption";
export * from "./bands";
export * from "./build-up";
export * from "./cavity-cache";
export * from "./end-corrections";
export * from "./evaluate";
export * from "./facing-impedance";
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
