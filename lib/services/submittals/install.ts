import { and, eq, inArray, isNotNull } from "drizzle-orm";
import { getDb, transaction } from "@/db/client";
import { attachment, installation, submittal, user, type Installation, type Submittal } from "@/db/schema";
import { notFound } from "@/lib/errors";
import { parseInput } from "@/lib/schemas/parse";
import { installedSchema } from "@/lib/schemas/submittal";
import { cleanSitePhoto } from "@/lib/site-photo";
import { storeFile } from "@/lib/storage";
import { readSnapshot, type SnapshotPlacement } from "@/lib/submittals";
import type { Actor } from "../actor";
import { recordAudit } from "../audit";
import { authorize } from "../guard";
import { attachmentUrl } from "../attachments";
import { openRevision, requireInForce, type RevisionAccess } from "./access";

// Install progress: the installer marks the panels of the approved revision in force as
// installed, each with a site photo if they like; every member sees the progress per room and
// for the project, and the consultant's board shows the installed panels.

export type InstalledPanel = { placementId: string; code: string; installedAt: string | null; installedBy: string | null; photo: { id: string; url: string } | null };

function openForInstall(actor: Actor | null, projectId: string, submittalId: string, placementId: string): { access: RevisionAccess; panel: SnapshotPlacement; surface: string } {
  const access = openRevision(actor, projectId, submittalId, "install.record");
  const { row } = access;
  requireInForce(row, "panels are recorded as installed only on");
  const snapshot = readSnapshot(row.snapshot!);
  const panel = snapshot.placements.find((p) => p.id === placementId);
  if (!panel) throw notFound("Panel");
  // Codes are unique per board, not per room: the surface says which P-001 it is.
  return { access, panel, surface: snapshot.surfaces.find((x) => x.key === panel.surfaceKey)?.name ?? panel.surfaceKey };
}

function record(submittalId: string, placementId: string): Installation | undefined {
  return getDb().select().from(installation).where(and(eq(installation.submittalId, submittalId), eq(installation.placementId, placementId))).get();
}

function view(row: Installation | undefined, panel: SnapshotPlacement, people: Map<string, string> = names()): InstalledPanel {
  return {
    placementId: panel.id,
    code: panel.code,
    installedAt: row?.installedAt?.toISOString() ?? null,
    installedBy: row?.installedBy ? (people.get(row.installedBy) ?? "A former member") : null,
    photo: row?.photoId ? { id: row.photoId, url: attachmentUrl(row.projectId, row.photoId) } : null,
  };
}

const names = () => new Map(getDb().select({ id: user.id, name: user.name }).from(user).all().map((u) => [u.id, u.name]));

export function setInstalled(actor: Actor | null, projectId: string, submittalId: string, placementId: string, raw: unknown): InstalledPanel {
  const { access, panel, surface } = openForInstall(actor, projectId, submittalId, placementId);
  const { installed } = parseInput(installedSchema, raw);
  transaction((tx) => {
    const values = installed ? { installedAt: new Date(), installedBy: access.actor.userId } : { installedAt: null, installedBy: null };
    tx.insert(installation)
      .values({ projectId, submittalId, placementId, code: panel.code, ...values })
      .onConflictDoUpdate({ target: [installation.submittalId, installation.placementId], set: values })
      .run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: installed ? "installation.marked" : "installation.unmarked", subjectId: submittalId, detail: { code: panel.code, surface, placementId } });
  });
  return view(record(submittalId, placementId), panel);
}

export async function attachSitePhoto(actor: Actor | null, projectId: string, submittalId: string, placementId: string, file: { name: string; bytes: Uint8Array | null }): Promise<InstalledPanel> {
  const { access, panel, surface } = openForInstall(actor, projectId, submittalId, placementId);
  const clean = await cleanSitePhoto(file.bytes);
  const stored = storeFile(clean.bytes, [clean.kind]);
  const ext = clean.kind === "jpeg" ? "jpg" : clean.kind;
  transaction((tx) => {
    const photo = tx
      .insert(attachment)
      .values({ projectId, purpose: "photo", sha256: stored.sha256, mime: stored.mime, size: stored.size, originalName: `${panel.code}-site-photo.${ext}`, uploadedBy: access.actor.userId })
      .returning()
      .get();
    tx.insert(installation)
      .values({ projectId, submittalId, placementId, code: panel.code, photoId: photo.id })
      .onConflictDoUpdate({ target: [installation.submittalId, installation.placementId], set: { photoId: photo.id } })
      .run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "installation.photo", subjectId: submittalId, detail: { code: panel.code, surface, placementId, sha256: stored.sha256, from: file.name.slice(0, 200) } });
  });
  return view(record(submittalId, placementId), panel);
}

/** Every panel of a revision with its install record, in the snapshot's order. */
export function installedPanels(row: Submittal): InstalledPanel[] {
  if (!row.snapshot) return [];
  const rows = new Map(getDb().select().from(installation).where(eq(installation.submittalId, row.id)).all().map((r) => [r.placementId, r]));
  const people = names();
  return readSnapshot(row.snapshot).placements.map((p) => view(rows.get(p.id), p, people));
}

export type RoomProgress = { roomId: string | null; roomName: string; submittalId: string; letter: string; state: Submittal["state"]; panels: number; installed: number; photos: number };
export type ProjectProgress = { rooms: RoomProgress[]; panels: number; installed: number };

/** The approved revisions in force of a project: the ones being built. */
function inForce(projectId: string): Submittal[] {
  return getDb()
    .select()
    .from(submittal)
    .where(and(eq(submittal.projectId, projectId), inArray(submittal.state, ["approved", "approved-as-noted"])))
    .all()
    .sort((a, b) => a.roomName.localeCompare(b.roomName));
}

export function progressOf(projectId: string): ProjectProgress {
  const revisions = inForce(projectId);
  const marks = revisions.length ? getDb().select().from(installation).where(inArray(installation.submittalId, revisions.map((r) => r.id))).all() : [];
  const rooms = revisions.map((r): RoomProgress => {
    const panels = r.snapshot ? readSnapshot(r.snapshot).placements.length : 0;
    const mine = marks.filter((m) => m.submittalId === r.id);
    return { roomId: r.roomId, roomName: r.roomName, submittalId: r.id, letter: r.letter, state: r.state, panels, installed: mine.filter((m) => m.installedAt).length, photos: mine.filter((m) => m.photoId).length };
  });
  return { rooms, panels: rooms.reduce((n, r) => n + r.panels, 0), installed: rooms.reduce((n, r) => n + r.installed, 0) };
}

export function projectProgress(actor: Actor | null, projectId: string): ProjectProgress {
  authorize(actor, projectId, "project.view");
  return progressOf(projectId);
}

/** Panels of a room's approved revision in force that are installed, by placement id, for the board. */
export function installedOnRoom(roomId: string): { letter: string; submittalId: string; placementIds: string[] } | null {
  const row = getDb()
    .select()
    .from(submittal)
    .where(and(eq(submittal.roomId, roomId), inArray(submittal.state, ["approved", "approved-as-noted"])))
    .get();
  if (!row) return null;
  const ids = getDb()
    .select({ id: installation.placementId })
    .from(installation)
    .where(and(eq(installation.submittalId, row.id), isNotNull(installation.installedAt)))
    .all()
    .map((r) => r.id);
  return { letter: row.letter, submittalId: row.id, placementIds: ids };
}
