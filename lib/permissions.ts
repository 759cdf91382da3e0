import type { ProjectRole } from "@/lib/roles";

// The permissions table of the product specification (section 2), as data. The guard reads
// it, the role test walks it, and screens use it only to hide what the server would refuse.
export const PERMISSIONS = {
  "project.view": ["consultant", "architect", "installer", "client"],
  "project.edit": ["consultant"],
  "team.view": ["consultant", "architect", "installer", "client"],
  "team.invite": ["consultant"],
  "team.remove": ["consultant"],
  "design.view": ["consultant", "architect"],
  "design.edit": ["consultant"],
  "pin.write": ["consultant", "architect"],
  "pin.resolve": ["consultant"],
  "drawing.upload": ["consultant", "architect"],
  "submittal.issue": ["consultant"],
  "submittal.viewIssued": ["consultant", "architect", "installer", "client"],
  "submittal.decide": ["client"],
  "shop.download": ["consultant", "installer"],
  "install.record": ["installer"],
} as const satisfies Record<string, readonly ProjectRole[]>;

export type ProjectAction = keyof typeof PERMISSIONS;

export function roleMay(role: ProjectRole, action: ProjectAction): boolean {
  return (PERMISSIONS[action] as readonly ProjectRole[]).includes(role);
}

export function actionsFor(role: ProjectRole): ProjectAction[] {
  return (Object.keys(PERMISSIONS) as ProjectAction[]).filter((a) => roleMay(role, a));
}

// Wording for refusals, so a member acting above their role is told what they may not do.
export const ACTION_WORDS: Record<ProjectAction, string> = {
  "project.view": "view this project",
  "project.edit": "edit this project",
  "team.view": "see the project team",
  "team.invite": "invite people to this project",
  "team.remove": "remove people from this project",
  "design.view": "see draft rooms, build-ups and layouts",
  "design.edit": "edit rooms, build-ups or layouts",
  "pin.write": "place or answer review pins",
  "pin.resolve": "resolve review pins",
  "drawing.upload": "upload reference drawings",
  "submittal.issue": "issue submittals",
  "submittal.viewIssued": "view issued submittals",
  "submittal.decide": "approve or return submittals",
  "shop.download": "download shop drawings",
  "install.record": "record install progress",
};

// Actions on accounts rather than on a project, and who may take them: anyone (no session
// needed: the e-mailed link is the proof), the account's own holder, or the administrator
// of the firm the account belongs to.
export const ACCOUNT_PERMISSIONS = {
  "password.reset": "anyone",
  "password.change": "self",
  "sessions.manage": "self",
  "account.disable": "firm-admin",
} as const satisfies Record<string, "anyone" | "self" | "firm-admin">;

export type AccountAction = keyof typeof ACCOUNT_PERMISSIONS;

export const ROLE_WORDS: Record<ProjectRole, string> = {
  consultant: "Consultant",
  architect: "Architect",
  installer: "Installer",
  client: "Client",
};
