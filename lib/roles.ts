// The four per-project roles of the product specification (section 2).
export const PROJECT_ROLES = ["consultant", "architect", "installer", "client"] as const;
export type ProjectRole = (typeof PROJECT_ROLES)[number];
