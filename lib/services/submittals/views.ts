import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { room, submittal, user, type Submittal, type SubmittalDocument } from "@/db/schema";
import { changeSentences, formatters } from "@/lib/documents";
import { roleMay } from "@/lib/permissions";
import type { ProjectRole } from "@/lib/roles";
import { readSnapshot, type ReadinessItem, type SnapshotPlacement, type SnapshotSurface, type SubmittalSnapshot, compareRevisions } from "@/lib/submittals";
import type { UnitPreference } from "@/lib/units";
import type { Actor } from "../actor";
import { authorize } from "../guard";
import { isApproved, mayOpen, openRevision, requireInForce } from "./access";
import { nameToSign } from "./decide";
import { documentsOf } from "./files";
import { historyOf, type HistoryLine } from "./history";
import { installedPanels, progressOf, type InstalledPanel, type ProjectProgress } from "./install";

export type RevisionSummary = {
  id: string;
  letter: string;
  state: Submittal["state"];
  outcome: Submittal["outcome"];
  roomId: string | null;
  roomName: string;
  issuedAt: string | null;
  issuedBy: string | null;
  decidedAt: string | null;
  decidedBy: string | null;
  renderError: string | null;
};

export type SubmittalList = {
  myRole: ProjectRole;
  may: { issue: boolean; decide: boolean; shop: boolean; install: boolean };
  rooms: { roomId: string | null; roomName: string; revisions: RevisionSummary[] }[];
  progress: ProjectProgress;
};

export type DocumentLink = { kind: SubmittalDocument["kind"]; units: UnitPreference; name: string; sha256: string; size: number; url: string };

export type SubmittalView = RevisionSummary & {
  projectId: string;
  myRole: ProjectRole;
  may: { decide: boolean; shop: boolean; install: boolean };
  snapshotSha256: string | null;
  pdf: DocumentLink | null;
  decisionRecord: DocumentLink | null;
  shopPacks: DocumentLink[];
  decision: { outcome: NonNullable<Submittal["outcome"]>; at: string; by: string | null; signature: string; notes: string; pdfSha256: string } | null;
  /** what the consultant confirmed at issue */
  confirmed: ReadinessItem[];
  previous: { id: string; letter: string } | null;
  supersededBy: { id: string; letter: string } | null;
  /** the change list since the previous revision, in sentences; null for a first revision */
  changes: string[] | null;
  schedule: SubmittalSnapshot["schedule"];
  meanAfter: { seconds: number | null; low: number | null; high: number | null; status: string } | null;
  fire: { code: string; name: string; message: string; flagged: boolean }[];
  openPins: number;
  history: HistoryLine[];
  /** the name a client types to sign */
  signAs: string;
  /** the panels to build, for an approved revision in force */
  install: { surfaces: SnapshotSurface[]; placements: (SnapshotPlacement & InstalledPanel)[] } | null;
};

const peopleNames = () => new Map(getDb().select({ id: user.id, name: user.name }).from(user).all().map((u) => [u.id, u.name]));

function summary(r: Submittal, people: Map<string, string>): RevisionSummary {
  const who = (id: string | null) => (id ? (people.get(id) ?? "A former member") : null);
  return {
    id: r.id,
    letter: r.letter,
    state: r.state,
    outcome: r.outcome,
    roomId: r.roomId,
    roomName: r.roomName,
    issuedAt: r.issuedAt?.toISOString() ?? null,
    issuedBy: who(r.issuedBy),
    decidedAt: r.decidedAt?.toISOString() ?? null,
    decidedBy: who(r.decidedBy),
    renderError: r.renderError,
  };
}

export function listSubmittals(actor: Actor | null, projectId: string): SubmittalList {
  const access = authorize(actor, projectId, "submittal.viewIssued");
  const role = access.membership.role;
  const db = getDb();
  const people = peopleNames();
  const visible = db.select().from(submittal).where(eq(submittal.projectId, projectId)).all().filter((r) => mayOpen(role, r.state));
  // The consultant sees every room (each may be issued); the others, the rooms with a revision they may open.
  const rooms = roleMay(role, "submittal.issue") ? db.select({ id: room.id, name: room.name }).from(room).where(eq(room.projectId, projectId)).orderBy(asc(room.name)).all() : [];
  const groups = new Map<string, { roomId: string | null; roomName: string; revisions: RevisionSummary[] }>();
  for (const r of rooms) groups.set(r.id, { roomId: r.id, roomName: r.name, revisions: [] });
  for (const r of visible.sort((a, b) => compareRevisions(b.letter, a.letter))) {
    const key = r.roomId ?? `gone:${r.roomName}`;
    const group = groups.get(key) ?? { roomId: r.roomId, roomName: r.roomName, revisions: [] };
    group.revisions.push(summary(r, people));
    groups.set(key, group);
  }
  return {
    myRole: role,
    may: { issue: roleMay(role, "submittal.issue"), decide: roleMay(role, "submittal.decide"), shop: roleMay(role, "shop.download"), install: roleMay(role, "install.record") },
    rooms: [...groups.values()].sort((a, b) => a.roomName.localeCompare(b.roomName)),
    progress: progressOf(projectId),
  };
}

const documentUrl = (projectId: string, id: string, path: string) => `/api/v1/projects/${projectId}/submittals/${id}/${path}`;

function link(projectId: string, d: SubmittalDocument): DocumentLink {
  const path = d.kind === "submittal" ? "pdf" : d.kind === "decision-record" ? "decision-record" : `shop-pack?units=${d.units}`;
  return { kind: d.kind, units: d.units, name: d.name, sha256: d.sha256, size: d.size, url: documentUrl(projectId, d.submittalId, path) };
}

function neighbours(row: Submittal) {
  if (!row.roomId) return { previous: null, supersededBy: null };
  const all = getDb().select({ id: submittal.id, letter: submittal.letter, state: submittal.state }).from(submittal).where(eq(submittal.roomId, row.roomId)).all();
  const earlier = all.filter((r) => r.state !== "draft" && compareRevisions(r.letter, row.letter) < 0).sort((a, b) => compareRevisions(a.letter, b.letter)).at(-1);
  const by = row.supersededBy ? all.find((r) => r.id === row.supersededBy) : undefined;
  return { previous: earlier ? { id: earlier.id, letter: earlier.letter } : null, supersededBy: by ? { id: by.id, letter: by.letter } : null };
}

export function getSubmittal(actor: Actor | null, projectId: string, submittalId: string): SubmittalView {
  const access = openRevision(actor, projectId, submittalId);
  const { row } = access;
  const role = access.membership.role;
  const people = peopleNames();
  const docs = documentsOf(row.id).map((d) => link(projectId, d));
  const snapshot = row.snapshot ? readSnapshot(row.snapshot) : null;
  const f = formatters(access.actor.unitPreference);
  const approvedInForce = isApproved(row.state);
  const codeOf = new Map(snapshot?.buildUps.map((b) => [b.id, b]) ?? []);
  const installed = approvedInForce ? new Map(installedPanels(row).map((p) => [p.placementId, p])) : null;
  return {
    ...summary(row, people),
    projectId,
    myRole: role,
    may: {
      decide: roleMay(role, "submittal.decide") && row.state === "issued" && row.issuedBy !== access.actor.userId,
      shop: roleMay(role, "shop.download") && approvedInForce,
      install: roleMay(role, "install.record") && approvedInForce,
    },
    snapshotSha256: row.snapshotSha256,
    pdf: docs.find((d) => d.kind === "submittal") ?? null,
    decisionRecord: docs.find((d) => d.kind === "decision-record") ?? null,
    shopPacks: roleMay(role, "shop.download") ? docs.filter((d) => d.kind === "shop-pack") : [],
    decision:
      row.outcome && row.decidedAt
        ? { outcome: row.outcome, at: row.decidedAt.toISOString(), by: people.get(row.decidedBy ?? "") ?? null, signature: row.signature ?? "", notes: row.notes ?? "", pdfSha256: row.decidedPdfSha256 ?? "" }
        : null,
    confirmed: row.confirmed ? (JSON.parse(row.confirmed) as ReadinessItem[]) : [],
    ...neighbours(row),
    changes: snapshot ? changeSentences(snapshot, f) : null,
    schedule: snapshot?.schedule ?? [],
    meanAfter: snapshot?.check.ok && snapshot.check.mean ? { seconds: snapshot.check.mean.after, low: snapshot.check.mean.low, high: snapshot.check.mean.high, status: snapshot.check.mean.status } : null,
    fire: snapshot?.fire.findings.map((x) => ({ code: codeOf.get(x.buildUpId)?.code ?? "", name: codeOf.get(x.buildUpId)?.name ?? "", message: x.finding.message, flagged: x.finding.flagged })) ?? [],
    openPins: snapshot?.pins.length ?? 0,
    history: historyOf(row, people),
    signAs: nameToSign(access.actor.name),
    install: snapshot && installed ? { surfaces: snapshot.surfaces.filter((s) => snapshot.placements.some((p) => p.surfaceKey === s.key)), placements: snapshot.placements.map((p) => ({ ...p, ...installed.get(p.id)! })) } : null,
  };
}

export type ShopPackEntry = { id: string; roomName: string; letter: string; state: Submittal["state"]; decidedAt: string | null; decidedBy: string | null; notes: string; packs: DocumentLink[]; panels: number; installed: number };

/** The shop packs of the approved revisions in force, for those who build or issue. */
export function listShopPacks(actor: Actor | null, projectId: string): { entries: ShopPackEntry[]; units: UnitPreference } {
  const access = authorize(actor, projectId, "shop.download");
  const people = peopleNames();
  const progress = progressOf(projectId);
  const rows = getDb().select().from(submittal).where(eq(submittal.projectId, projectId)).all().filter((r) => isApproved(r.state));
  const entries = rows
    .map((r): ShopPackEntry => {
      const p = progress.rooms.find((x) => x.submittalId === r.id);
      return {
        id: r.id,
        roomName: r.roomName,
        letter: r.letter,
        state: r.state,
        decidedAt: r.decidedAt?.toISOString() ?? null,
        decidedBy: r.decidedBy ? (people.get(r.decidedBy) ?? null) : null,
        notes: r.notes ?? "",
        packs: documentsOf(r.id).filter((d) => d.kind === "shop-pack").map((d) => link(projectId, d)),
        panels: p?.panels ?? 0,
        installed: p?.installed ?? 0,
      };
    })
    .sort((a, b) => a.roomName.localeCompare(b.roomName));
  return { entries, units: access.actor.unitPreference };
}

/** One approved revision in force as the Shop pack screen shows it; any other state is refused, naming it. */
export function getShopPack(actor: Actor | null, projectId: string, submittalId: string): SubmittalView {
  const { row } = openRevision(actor, projectId, submittalId, "shop.download");
  requireInForce(row, "a shop pack is made only from");
  return getSubmittal(actor, projectId, submittalId);
}
