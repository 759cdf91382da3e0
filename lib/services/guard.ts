import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { membership, project, type Membership, type Project } from "@/db/schema";
import { AppError, forbidden, notFound, unauthenticated } from "@/lib/errors";
import { ACCOUNT_PERMISSIONS, ACTION_WORDS, ROLE_WORDS, roleMay, type AccountAction, type ProjectAction } from "@/lib/permissions";
import type { Actor } from "./actor";

// The one server-side guard. Every service that acts on a project calls authorize() first;
// actions outside a project call requireActor() or requireFirmAdmin(). It only reads.

export function requireActor(actor: Actor | null): Actor {
  if (!actor) throw unauthenticated();
  return actor;
}

export function requireFirmMember(actor: Actor | null): Actor & { firmId: string } {
  const a = requireActor(actor);
  if (!a.firmId) throw forbidden("Only members of a consultancy can do this.");
  return a as Actor & { firmId: string };
}

export function requireFirmAdmin(actor: Actor | null): Actor & { firmId: string } {
  const a = requireFirmMember(actor);
  if (!a.isFirmAdmin) throw forbidden("Only the firm administrator can manage accounts.");
  return a;
}

type ActorFor<A extends AccountAction> = (typeof ACCOUNT_PERMISSIONS)[A] extends "anyone"
  ? Actor | null
  : (typeof ACCOUNT_PERMISSIONS)[A] extends "firm-admin"
    ? Actor & { firmId: string }
    : Actor;

// Account actions (password, sessions, disabling) by the table in lib/permissions.ts.
export function authorizeAccount<A extends AccountAction>(actor: Actor | null, action: A): ActorFor<A> {
  const who = ACCOUNT_PERMISSIONS[action] as string;
  if (who === "anyone") return actor as ActorFor<A>;
  if (who === "firm-admin") return requireFirmAdmin(actor) as ActorFor<A>;
  return requireActor(actor) as ActorFor<A>;
}

export type ProjectAccess = { actor: Actor; project: Project; membership: Membership };

export function authorize(actor: Actor | null, projectId: string, action: ProjectAction): ProjectAccess {
  const a = requireActor(actor);
  const db = getDb();
  const found = db.select().from(project).where(eq(project.id, projectId)).get();
  // A project you are not a member of is reported as not found, so ids reveal nothing.
  const member = found
    ? db
        .select()
        .from(membership)
        .where(and(eq(membership.projectId, projectId), eq(membership.userId, a.userId)))
        .get()
    : undefined;
  if (!found || !member) throw notFound("Project");
  if (!roleMay(member.role, action)) {
    throw forbidden(`As ${ROLE_WORDS[member.role].toLowerCase()} on this project you may not ${ACTION_WORDS[action]}.`);
  }
  return { actor: a, project: found, membership: member };
}

export function isAppError(e: unknown): e is AppError {
  return e instanceof AppError;
}
