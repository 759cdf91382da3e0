/**
 * Fire classes of interior finishes: reading, printing and comparing declared against required
 * classes in the North American and European systems. Pure TypeScript; no framework imports.
 */
export * from "./classes";
export * from "./compare";
export * from "./required";
