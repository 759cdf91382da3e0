/**
 * Submittal revisions without a database: the snapshot of everything a submittal shows, its
 * canonical JSON and SHA-256, revision letters, and the change list between two revisions.
 * A service loads the rows and calls buildSnapshot; documents (lib/documents) render from the
 * result alone.
 */
export * from "./build-snapshot";
export * from "./canonical";
export * from "./changes";
export * from "./panel-types";
export * from "./revision";
export * from "./snapshot";
export * from "./stored";
export * from "./readiness";
