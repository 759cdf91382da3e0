import { and, eq } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { membership, submittal, user, type Submittal, type SubmittalState } from "@/db/schema";
import { conflict, notFound } from "@/lib/errors";
import { type ProjectAction, ROLE_WORDS } from "@/lib/permissions";
import type { ProjectRole } from "@/lib/roles";
import type { Actor } from "../actor";
import { authorize, type ProjectAccess } from "../guard";

// Who may open a revision in which state. The role table (lib/permissions.ts) says who may see
// issued submittals at all; the state decides the rest: drafts stay with the design team, and
// the installer sees a revision only once it is approved and until it is superseded.

export const STATE_WORDS: Record<SubmittalState, string> = {
  draft: "a draft",
  issued: "issued, awaiting the client's decision",
  approved: "approved",
  "approved-as-noted": "approved as noted",
  returned: "returned for revision",
  superseded: "superseded",
};

export const isApproved = (state: SubmittalState) => state === "approved" || state === "approved-as-noted";

/** For what only an approved revision in force allows (a shop pack, install marks): the refusal naming its state. */
export function requireInForce(row: Submittal, what: string): void {
  if (!isApproved(row.state) || !row.snapshot) throw conflict(`${revisionName(row)} is ${STATE_WORDS[row.state]}; ${what} an approved revision in force.`, "state");
}

export function mayOpen(role: ProjectRole, state: SubmittalState): boolean {
  if (role === "consultant" || role === "architect") return true;
  if (role === "client") return state !== "draft";
  return isApproved(state);
}

export type RevisionAccess = ProjectAccess & { row: Submittal };

export function loadRevision(projectId: string, submittalId: string): Submittal {
  const row = getDb()
    .select()
    .from(submittal)
    .where(and(eq(submittal.id, submittalId), eq(submittal.projectId, projectId)))
    .get();
  // Another project's revision is reported exactly as one that does not exist.
  if (!row) throw notFound("Submittal");
  return row;
}

export const revisionName = (row: Pick<Submittal, "roomName" | "letter">) => `Revision ${row.letter} of ${row.roomName}`;

/** Why a member of this role may not open this revision, or null when they may. */
export function closedBecause(role: ProjectRole, row: Submittal, supersededBy?: string | null): string | null {
  if (mayOpen(role, row.state)) return null;
  const who = `${ROLE_WORDS[role].toLowerCase()}s`;
  if (row.state === "draft") return `${revisionName(row)} is a draft; ${who} see it once it is issued.`;
  if (row.state === "superseded") return `${revisionName(row)} was superseded${supersededBy ? ` by revision ${supersededBy}` : ""}; installers see only the approved revision in force.`;
  return `${revisionName(row)} is ${STATE_WORDS[row.state]}; installers see a revision once the client approves it.`;
}

/** The guard, then the revision in this project, then whether this role may open it in its state. */
export function openRevision(actor: Actor | null, projectId: string, submittalId: string, action: ProjectAction = "submittal.viewIssued"): RevisionAccess {
  const access = authorize(actor, projectId, action);
  const row = loadRevision(projectId, submittalId);
  const why = closedBecause(access.membership.role, row, row.supersededBy ? letterOf(row.supersededBy) : null);
  if (why) throw conflict(why, "state");
  return { ...access, row };
}

export const letterOf = (submittalId: string) => getDb().select({ letter: submittal.letter }).from(submittal).where(eq(submittal.id, submittalId)).get()?.letter ?? null;

/** Members of the project in the given roles, with what a message to them needs. */
export function membersIn(tx: Tx, projectId: string, roles: readonly ProjectRole[]) {
  return tx
    .select({ userId: user.id, name: user.name, email: user.email, role: membership.role, units: user.unitPreference, disabledAt: user.disabledAt })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(eq(membership.projectId, projectId))
    .all()
    .filter((m) => roles.includes(m.role) && !m.disabledAt);
}
