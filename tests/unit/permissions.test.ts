import { describe, expect, it } from "vitest";
import { PERMISSIONS, roleMay, type ProjectAction } from "@/lib/permissions";
import { PROJECT_ROLES, type ProjectRole } from "@/lib/roles";

// The permissions table against the product specification, section 2 ("People and roles"),
// one statement of the specification per line.
const SPEC: [ProjectRole, ProjectAction, boolean, string][] = [
  ["consultant", "design.edit", true, "consultant creates and edits rooms, surfaces, build-ups, layouts"],
  ["consultant", "team.invite", true, "consultant invites members"],
  ["consultant", "submittal.issue", true, "consultant issues submittals"],
  ["consultant", "pin.resolve", true, "consultant resolves any review pin"],
  ["consultant", "submittal.decide", false, "consultant may not approve their own submittal"],
  ["architect", "design.view", true, "architect views everything in the project"],
  ["architect", "pin.write", true, "architect places and answers review pins"],
  ["architect", "drawing.upload", true, "architect uploads reference drawings"],
  ["architect", "design.edit", false, "architect may not edit rooms, build-ups or layouts"],
  ["architect", "submittal.issue", false, "architect may not issue"],
  ["architect", "submittal.decide", false, "architect may not approve"],
  ["installer", "submittal.viewIssued", true, "installer views issued and approved submittals"],
  ["installer", "shop.download", true, "installer downloads shop drawings"],
  ["installer", "install.record", true, "installer records install progress and site photos"],
  ["installer", "design.view", false, "installer may not see drafts"],
  ["installer", "design.edit", false, "installer may not edit the design"],
  ["client", "submittal.viewIssued", true, "client views issued submittals"],
  ["client", "submittal.decide", true, "client approves, approves with notes, or returns"],
  ["client", "design.view", false, "client may not see drafts"],
  ["client", "design.edit", false, "client may not edit anything"],
  ["client", "team.invite", false, "client may not edit anything"],
];

describe("permissions table", () => {
  it.each(SPEC)("%s %s → %s (%s)", (role, action, allowed) => {
    expect(roleMay(role, action)).toBe(allowed);
  });

  it("names only the four project roles", () => {
    for (const roles of Object.values(PERMISSIONS)) for (const r of roles) expect(PROJECT_ROLES).toContain(r);
  });

  it("lets only the consultant change anything in the design", () => {
    const editing: ProjectAction[] = ["design.edit", "project.edit", "team.invite", "submittal.issue", "pin.resolve"];
    for (const a of editing) expect(PERMISSIONS[a]).toEqual(["consultant"]);
  });
});
