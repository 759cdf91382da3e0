import { asc, count, eq } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { membership, project, room, user, type ProjectRole } from "@/db/schema";
import { actionsFor, roleMay, type ProjectAction } from "@/lib/permissions";
import { parseInput } from "@/lib/schemas/parse";
import { createProjectSchema, updateProjectSchema } from "@/lib/schemas/project";
import type { Actor } from "./actor";
import { authorize, requireActor, requireFirmMember } from "./guard";
import { recordAudit } from "./audit";
import { listOpenInvitations, type InvitationSummary } from "./invitations";
import { openPinCounts } from "./boards";

export type ProjectListItem = {
  id: string;
  name: string;
  reference: string | null;
  site: string | null;
  role: ProjectRole;
  members: number;
  updatedAt: string;
};

export function listMyProjects(actor: Actor | null): ProjectListItem[] {
  const a = requireActor(actor);
  const db = getDb();
  const rows = db
    .select({ p: project, role: membership.role })
    .from(membership)
    .innerJoin(project, eq(project.id, membership.projectId))
    .where(eq(membership.userId, a.userId))
    .orderBy(asc(project.name))
    .all();
  return rows.map(({ p, role }) => ({
    id: p.id,
    name: p.name,
    reference: p.reference,
    site: p.site,
    role,
    members: db.select({ n: count() }).from(membership).where(eq(membership.projectId, p.id)).get()?.n ?? 0,
    updatedAt: p.updatedAt.toISOString(),
  }));
}

export function createProject(actor: Actor | null, raw: unknown): ProjectListItem {
  const a = requireFirmMember(actor);
  const input = parseInput(createProjectSchema, raw);
  const created = transaction((tx) => {
    const p = tx
      .insert(project)
      .values({ firmId: a.firmId, name: input.name, reference: input.reference || null, site: input.site || null, createdBy: a.userId })
      .returning()
      .get();
    tx.insert(membership).values({ projectId: p.id, userId: a.userId, role: "consultant" }).run();
    recordAudit(tx, { actorId: a.userId, projectId: p.id, action: "project.created", subjectId: p.id, detail: { name: p.name } });
    return p;
  });
  return {
    id: created.id,
    name: created.name,
    reference: created.reference,
    site: created.site,
    role: "consultant",
    members: 1,
    updatedAt: created.updatedAt.toISOString(),
  };
}

export type TeamMember = { userId: string; name: string; email: string; role: ProjectRole; since: string };

export function listTeam(actor: Actor | null, projectId: string): TeamMember[] {
  authorize(actor, projectId, "team.view");
  return getDb()
    .select({ userId: user.id, name: user.name, email: user.email, role: membership.role, since: membership.createdAt })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(eq(membership.projectId, projectId))
    .orderBy(asc(membership.createdAt))
    .all()
    .map((m) => ({ ...m, since: m.since.toISOString() }));
}

export type RoomSummary = {
  id: string;
  name: string;
  use: string;
  length: number | null;
  width: number | null;
  height: number | null;
  volume: number | null;
};

export type ProjectOverview = {
  project: { id: string; name: string; reference: string | null; site: string | null; createdAt: string; edgeClearance: number; fireRequired: string | null };
  myRole: ProjectRole;
  mayDo: ProjectAction[];
  team: TeamMember[];
  rooms: RoomSummary[] | null;
  invitations: InvitationSummary[] | null;
  /** open review pins across the project's boards; null for roles that see no drafts */
  openPins: number | null;
};

export function getProjectOverview(actor: Actor | null, projectId: string): ProjectOverview {
  const access = authorize(actor, projectId, "project.view");
  const role = access.membership.role;
  const rooms = roleMay(role, "design.view")
    ? getDb()
        .select({ id: room.id, name: room.name, use: room.use, length: room.length, width: room.width, height: room.height, volume: room.volume })
        .from(room)
        .where(eq(room.projectId, projectId))
        .orderBy(asc(room.name))
        .all()
    : null;
  return {
    project: {
      id: access.project.id,
      name: access.project.name,
      reference: access.project.reference,
      site: access.project.site,
      createdAt: access.project.createdAt.toISOString(),
      edgeClearance: access.project.edgeClearance,
      fireRequired: access.project.fireRequired,
    },
    myRole: role,
    mayDo: actionsFor(role),
    team: listTeam(actor, projectId),
    rooms,
    invitations: roleMay(role, "team.invite") ? listOpenInvitations(actor, projectId) : null,
    openPins: roleMay(role, "design.view") ? [...openPinCounts(projectId).values()].reduce((a, n) => a + n, 0) : null,
  };
}

export function updateProject(actor: Actor | null, projectId: string, raw: unknown): ProjectOverview {
  const access = authorize(actor, projectId, "project.edit");
  const input = parseInput(updateProjectSchema, raw);
  transaction((tx) => {
    tx.update(project)
      .set({
        ...(input.name !== undefined && { name: input.name }),
        ...(input.reference !== undefined && { reference: input.reference || null }),
        ...(input.site !== undefined && { site: input.site || null }),
        ...(input.edgeClearance !== undefined && { edgeClearance: input.edgeClearance }),
        ...(input.fireRequired !== undefined && { fireRequired: input.fireRequired }),
      })
      .where(eq(project.id, projectId))
      .run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "project.updated", subjectId: projectId, detail: input });
  });
  return getProjectOverview(actor, projectId);
}
