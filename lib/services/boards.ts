import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { getDb, transaction, type Tx } from "@/db/client";
import { attachment, board, buildUp, membership, pin, pinReply, placement, room, surface, user, type Board, type Surface as SurfaceRow } from "@/db/schema";
import { conflict, invalid, notFound } from "@/lib/errors";
import { ROLE_WORDS } from "@/lib/permissions";
import type { ProjectRole } from "@/lib/roles";
import { parseInput } from "@/lib/schemas/parse";
import { boardSchemas, drawingSchema, replyInputSchema, resolveInputSchema } from "@/lib/schemas/board";
import { deliver, enqueueMail } from "@/lib/mail/outbox";
import { env } from "@/lib/env";
import type { EvaluateInput } from "@/lib/acoustics/contract";
import type { Actor } from "./actor";
import { authorize } from "./guard";
import { recordAudit } from "./audit";
import { requireAttachment, summarizeAttachment } from "./attachments";
import { installedOnRoom } from "./submittals/install";

// The elevation board of a surface: panels (placements), review pins with their threads, and
// a reference drawing. Panels are saved as one document per board with a version.

export type BoardPlacement = { id: string; buildUpId: string; code: string; x: number; y: number; width: number; height: number };
export type PinView = {
  id: string;
  number: number;
  x: number;
  y: number;
  body: string;
  author: { name: string; role: ProjectRole | null };
  createdAt: string;
  resolved: { at: string; by: string } | null;
  replies: { id: string; body: string; author: { name: string; role: ProjectRole | null }; createdAt: string }[];
};

export type BoardView = {
  projectId: string;
  roomId: string;
  surfaceKey: string;
  boardId: string | null;
  version: number;
  gridModule: number;
  clearance: number;
  drawing: { attachmentId: string; url: string; name: string; x: number; y: number; metresPerPixel: number; opacity: number } | null;
  placements: BoardPlacement[];
  pins: PinView[];
  buildUps: { id: string; name: string; facing: EvaluateInput["facing"]; moduleWidth: number; moduleHeight: number; borderX: number; borderY: number }[];
  /** panels marked installed on the room's approved revision in force, by placement id */
  installed: { letter: string; submittalId: string; placementIds: string[] } | null;
};

function loadSurface(projectId: string, roomId: string, surfaceKey: string): SurfaceRow {
  const db = getDb();
  const r = db.select().from(room).where(and(eq(room.id, roomId), eq(room.projectId, projectId))).get();
  if (!r) throw notFound("Room");
  const s = db.select().from(surface).where(and(eq(surface.roomId, roomId), eq(surface.key, surfaceKey))).get();
  if (!s) throw notFound("Surface");
  return s;
}

const boardOf = (surfaceId: string) => getDb().select().from(board).where(eq(board.surfaceId, surfaceId)).get();

function ensureBoard(tx: Tx, surfaceId: string): Board {
  return tx.select().from(board).where(eq(board.surfaceId, surfaceId)).get() ?? tx.insert(board).values({ surfaceId, version: 0 }).returning().get();
}

function roles(projectId: string): Map<string, ProjectRole> {
  return new Map(getDb().select().from(membership).where(eq(membership.projectId, projectId)).all().map((m) => [m.userId, m.role]));
}

// A panel's id is the editor's and unique within its board; its row is keyed by the board's
// id with it, so an id that exists on another board (another project's) neither clashes nor
// reveals anything. Rows written before this carry the bare id.
const placementRowId = (boardId: string, panelId: string) => `${boardId}:${panelId}`;
const panelIdOf = (boardId: string, rowId: string) => (rowId.startsWith(`${boardId}:`) ? rowId.slice(boardId.length + 1) : rowId);

export function boardPlacements(boardId: string): BoardPlacement[] {
  return getDb()
    .select({ id: placement.id, buildUpId: placement.buildUpId, code: placement.code, x: placement.x, y: placement.y, width: placement.width, height: placement.height })
    .from(placement)
    .where(eq(placement.boardId, boardId))
    .orderBy(asc(placement.position))
    .all()
    .map((p) => ({ ...p, id: panelIdOf(boardId, p.id) }));
}

function pinsOf(projectId: string, boardId: string): PinView[] {
  const db = getDb();
  const pins = db.select().from(pin).where(eq(pin.boardId, boardId)).orderBy(asc(pin.number)).all();
  if (pins.length === 0) return [];
  const replies = db.select().from(pinReply).where(inArray(pinReply.pinId, pins.map((p) => p.id))).orderBy(asc(pinReply.createdAt)).all();
  const people = new Map(db.select({ id: user.id, name: user.name }).from(user).all().map((u) => [u.id, u.name]));
  const roleOf = roles(projectId);
  const who = (id: string | null) => ({ name: (id && people.get(id)) || "A former member", role: (id && roleOf.get(id)) || null });
  return pins.map((p) => ({
    id: p.id,
    number: p.number,
    x: p.x,
    y: p.y,
    body: p.body,
    author: who(p.authorId),
    createdAt: p.createdAt.toISOString(),
    resolved: p.resolvedAt ? { at: p.resolvedAt.toISOString(), by: who(p.resolvedBy).name } : null,
    replies: replies.filter((r) => r.pinId === p.id).map((r) => ({ id: r.id, body: r.body, author: who(r.authorId), createdAt: r.createdAt.toISOString() })),
  }));
}

export function getBoard(actor: Actor | null, projectId: string, roomId: string, surfaceKey: string): BoardView {
  const access = authorize(actor, projectId, "design.view");
  const s = loadSurface(projectId, roomId, surfaceKey);
  const b = boardOf(s.id);
  const drawing = b?.drawingId ? getDb().select().from(attachment).where(eq(attachment.id, b.drawingId)).get() : undefined;
  const buildUps = getDb().select().from(buildUp).where(eq(buildUp.projectId, projectId)).orderBy(asc(buildUp.name)).all();
  return {
    projectId,
    roomId,
    surfaceKey,
    boardId: b?.id ?? null,
    version: b?.version ?? 0,
    gridModule: b?.gridModule ?? 0.3,
    clearance: access.project.edgeClearance,
    drawing:
      b && drawing
        ? { attachmentId: drawing.id, url: summarizeAttachment(drawing).url, name: drawing.originalName, x: b.drawingX, y: b.drawingY, metresPerPixel: b.drawingMetresPerPixel, opacity: b.drawingOpacity }
        : null,
    placements: b ? boardPlacements(b.id) : [],
    pins: b ? pinsOf(projectId, b.id) : [],
    buildUps: buildUps.map((u) => ({
      id: u.id,
      name: u.name,
      facing: (JSON.parse(u.spec) as EvaluateInput).facing,
      moduleWidth: u.moduleWidth,
      moduleHeight: u.moduleHeight,
      borderX: u.borderX,
      borderY: u.borderY,
    })),
    installed: installedOnRoom(roomId),
  };
}

export function saveBoard(actor: Actor | null, projectId: string, roomId: string, surfaceKey: string, raw: unknown): BoardView {
  const access = authorize(actor, projectId, "design.edit");
  const s = loadSurface(projectId, roomId, surfaceKey);
  const input = parseInput(boardSchemas(access.actor.unitPreference, s).save, raw);
  const known = new Set(getDb().select({ id: buildUp.id }).from(buildUp).where(eq(buildUp.projectId, projectId)).all().map((b) => b.id));
  const issues: { field: string; message: string }[] = [];
  const codes = new Set<string>();
  const ids = new Set<string>();
  input.placements.forEach((p, i) => {
    if (!known.has(p.buildUpId)) issues.push({ field: `placements.${i}.buildUpId`, message: "That build-up is not in this project's library." });
    if (codes.has(p.code)) issues.push({ field: `placements.${i}.code`, message: `Two panels are coded ${p.code}.` });
    if (ids.has(p.id)) issues.push({ field: `placements.${i}.id`, message: "Two panels have the same id." });
    codes.add(p.code);
    ids.add(p.id);
  });
  if (issues.length) throw invalid(issues);
  transaction((tx) => {
    const b = ensureBoard(tx, s.id);
    // Only the version the editor started from may be replaced: a stale save changes nothing.
    const bumped = tx
      .update(board)
      .set({ version: input.version + 1, gridModule: input.gridModule })
      .where(and(eq(board.id, b.id), eq(board.version, input.version)))
      .returning()
      .get();
    if (!bumped) throw conflict(`This board was changed by someone else (now version ${b.version}). Reload it to see their changes; nothing of yours was saved.`, "version");
    tx.delete(placement).where(eq(placement.boardId, b.id)).run();
    input.placements.forEach((p, position) => tx.insert(placement).values({ ...p, id: placementRowId(b.id, p.id), boardId: b.id, position }).run());
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "board.saved", subjectId: b.id, detail: { surfaceKey, version: bumped.version, panels: input.placements.length } });
  });
  return getBoard(actor, projectId, roomId, surfaceKey);
}

export function setDrawing(actor: Actor | null, projectId: string, roomId: string, surfaceKey: string, raw: unknown): BoardView {
  const access = authorize(actor, projectId, "drawing.upload");
  const s = loadSurface(projectId, roomId, surfaceKey);
  const input = parseInput(drawingSchema, raw);
  if (input.attachmentId) requireAttachment(projectId, input.attachmentId, "drawing", "attachmentId");
  transaction((tx) => {
    const b = ensureBoard(tx, s.id);
    tx.update(board)
      .set({ drawingId: input.attachmentId, drawingX: input.x, drawingY: input.y, drawingMetresPerPixel: input.metresPerPixel, drawingOpacity: input.opacity })
      .where(eq(board.id, b.id))
      .run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "board.drawing", subjectId: b.id, detail: { attachmentId: input.attachmentId } });
  });
  return getBoard(actor, projectId, roomId, surfaceKey);
}

// Each new pin or reply tells the other side: what an architect writes goes to the
// consultants, what a consultant writes goes to the architects (and to the pin's author).
function notifyPin(tx: Tx, args: { projectId: string; authorId: string; authorRole: ProjectRole; pinAuthorId: string | null; subject: string; text: string }) {
  const members = tx
    .select({ userId: membership.userId, role: membership.role, email: user.email })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(eq(membership.projectId, args.projectId))
    .all();
  const otherSide: ProjectRole = args.authorRole === "architect" ? "consultant" : "architect";
  const to = members.filter((m) => m.userId !== args.authorId && (m.role === otherSide || m.userId === args.pinAuthorId));
  return to.map((m) => enqueueMail(tx, { to: m.email, subject: args.subject, text: args.text, projectId: args.projectId }));
}

function boardLink(projectId: string, roomId: string, surfaceKey: string, pinNumber: number) {
  return `${env().appUrl}/projects/${projectId}/rooms/${roomId}/board/${surfaceKey}?pin=${pinNumber}`;
}

export async function createPin(actor: Actor | null, projectId: string, roomId: string, surfaceKey: string, raw: unknown) {
  const access = authorize(actor, projectId, "pin.write");
  const s = loadSurface(projectId, roomId, surfaceKey);
  const input = parseInput(boardSchemas(access.actor.unitPreference, s).pin, raw);
  const roomName = getDb().select({ name: room.name }).from(room).where(eq(room.id, roomId)).get()!.name;
  const { made, mails } = transaction((tx) => {
    const b = ensureBoard(tx, s.id);
    const number = tx.select({ n: pin.number }).from(pin).where(eq(pin.boardId, b.id)).all().reduce((m, p) => Math.max(m, p.n), 0) + 1;
    const made = tx.insert(pin).values({ boardId: b.id, number, x: input.x, y: input.y, body: input.body, authorId: access.actor.userId }).returning().get();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "pin.created", subjectId: made.id, detail: { surfaceKey, number } });
    const mails = notifyPin(tx, {
      projectId,
      authorId: access.actor.userId,
      authorRole: access.membership.role,
      pinAuthorId: null,
      subject: `Pin ${number} on ${roomName}, ${s.name}: ${access.project.name}`,
      text: `${access.actor.name} (${ROLE_WORDS[access.membership.role].toLowerCase()}) placed pin ${number} on ${s.name} of ${roomName}:\n\n${input.body}\n\nOpen the board: ${boardLink(projectId, roomId, surfaceKey, number)}\n`,
    });
    return { made, mails };
  });
  await deliver(mails);
  return { id: made.id, number: made.number };
}

function loadPin(projectId: string, pinId: string) {
  const db = getDb();
  const row = db
    .select({ pin, surface, roomId: room.id, roomName: room.name })
    .from(pin)
    .innerJoin(board, eq(board.id, pin.boardId))
    .innerJoin(surface, eq(surface.id, board.surfaceId))
    .innerJoin(room, eq(room.id, surface.roomId))
    .where(and(eq(pin.id, pinId), eq(room.projectId, projectId)))
    .get();
  if (!row) throw notFound("Pin");
  return row;
}

export async function replyToPin(actor: Actor | null, projectId: string, pinId: string, raw: unknown) {
  const access = authorize(actor, projectId, "pin.write");
  const found = loadPin(projectId, pinId);
  const input = parseInput(replyInputSchema, raw);
  const { reply, mails } = transaction((tx) => {
    const reply = tx.insert(pinReply).values({ pinId, body: input.body, authorId: access.actor.userId }).returning().get();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: "pin.replied", subjectId: pinId });
    const mails = notifyPin(tx, {
      projectId,
      authorId: access.actor.userId,
      authorRole: access.membership.role,
      pinAuthorId: found.pin.authorId,
      subject: `Reply on pin ${found.pin.number}, ${found.roomName}: ${access.project.name}`,
      text: `${access.actor.name} (${ROLE_WORDS[access.membership.role].toLowerCase()}) replied on pin ${found.pin.number} ("${found.pin.body.slice(0, 80)}"):\n\n${input.body}\n\nOpen the board: ${boardLink(projectId, found.roomId, found.surface.key, found.pin.number)}\n`,
    });
    return { reply, mails };
  });
  await deliver(mails);
  return { id: reply.id };
}

export function resolvePin(actor: Actor | null, projectId: string, pinId: string, raw: unknown) {
  const access = authorize(actor, projectId, "pin.resolve");
  loadPin(projectId, pinId);
  const { resolved } = parseInput(resolveInputSchema, raw);
  transaction((tx) => {
    tx.update(pin)
      .set(resolved ? { resolvedAt: new Date(), resolvedBy: access.actor.userId } : { resolvedAt: null, resolvedBy: null })
      .where(eq(pin.id, pinId))
      .run();
    recordAudit(tx, { actorId: access.actor.userId, projectId, action: resolved ? "pin.resolved" : "pin.reopened", subjectId: pinId });
  });
  return { id: pinId, resolved };
}

// Open pins per room of a project, for the rooms list and the project overview.
export function openPinCounts(projectId: string): Map<string, number> {
  const rows = getDb()
    .select({ roomId: room.id })
    .from(pin)
    .innerJoin(board, eq(board.id, pin.boardId))
    .innerJoin(surface, eq(surface.id, board.surfaceId))
    .innerJoin(room, eq(room.id, surface.roomId))
    .where(and(eq(room.projectId, projectId), isNull(pin.resolvedAt)))
    .all();
  const counts = new Map<string, number>();
  for (const r of rows) counts.set(r.roomId, (counts.get(r.roomId) ?? 0) + 1);
  return counts;
}

// The panels placed on a room's boards, per surface key, for the room's check (which counts
// only the part of them that can exist: lib/board/treated-area.ts).
export function placedPanels(roomId: string): { surfaceKey: string; placements: Pick<BoardPlacement, "buildUpId" | "x" | "y" | "width" | "height">[] }[] {
  const rows = getDb()
    .select({ key: surface.key, buildUpId: placement.buildUpId, x: placement.x, y: placement.y, width: placement.width, height: placement.height })
    .from(placement)
    .innerJoin(board, eq(board.id, placement.boardId))
    .innerJoin(surface, eq(surface.id, board.surfaceId))
    .where(eq(surface.roomId, roomId))
    .orderBy(asc(placement.position))
    .all();
  const boards = new Map<string, { surfaceKey: string; placements: Pick<BoardPlacement, "buildUpId" | "x" | "y" | "width" | "height">[] }>();
  for (const { key, ...p } of rows) {
    const b = boards.get(key) ?? { surfaceKey: key, placements: [] };
    b.placements.push(p);
    boards.set(key, b);
  }
  return [...boards.values()];
}
