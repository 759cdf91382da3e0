/**
 * The stored rows of one room, as lib/submittals' buildSnapshot takes them: the project, the
 * room, its surfaces, openings, treatments, boards, placements and pins, the project's
 * build-ups, and a material lookup (the project's own materials, then the library).
 */
import { and, eq, inArray } from "drizzle-orm";
import type { Db } from "@/db/client";
import { board, buildUp, opening, pin, placement, project, projectMaterial, room, surface, treatment, user } from "@/db/schema";
import { MATERIALS } from "@/lib/rooms/materials-library";
import type { MaterialInfo, SnapshotSource } from "@/lib/submittals";

export type RoomRows = Omit<SnapshotSource, "fire" | "revision" | "consultant"> & { fire: { project: string | null; room: string | null } };

/** The room's rows, or null when the room is not in the project. */
export function roomRows(db: Db, projectId: string, roomId: string): RoomRows | null {
  const p = db.select().from(project).where(eq(project.id, projectId)).get();
  const r = p ? db.select().from(room).where(and(eq(room.projectId, p.id), eq(room.id, roomId))).get() : undefined;
  if (!p || !r) return null;
  const surfaces = db.select().from(surface).where(eq(surface.roomId, r.id)).all();
  const surfaceIds = surfaces.map((s) => s.id);
  const boards = surfaceIds.length ? db.select().from(board).where(inArray(board.surfaceId, surfaceIds)).all() : [];
  const boardIds = boards.map((b) => b.id);
  const own = db.select().from(projectMaterial).where(eq(projectMaterial.projectId, p.id)).all();
  const materials = new Map<string, MaterialInfo>([
    ...MATERIALS.map((m): [string, MaterialInfo] => [m.key, { name: m.name, alpha: m.alpha, source: m.source }]),
    ...own.map((m): [string, MaterialInfo] => [`project:${m.id}`, { name: m.name, alpha: JSON.parse(m.alpha), source: m.source }]),
  ]);
  return {
    project: p,
    room: r,
    surfaces,
    openings: surfaceIds.length ? db.select().from(opening).where(inArray(opening.surfaceId, surfaceIds)).all() : [],
    treatments: db.select().from(treatment).where(eq(treatment.roomId, r.id)).all(),
    buildUps: db.select().from(buildUp).where(eq(buildUp.projectId, p.id)).all(),
    boards,
    placements: boardIds.length ? db.select().from(placement).where(inArray(placement.boardId, boardIds)).all() : [],
    pins: boardIds.length ? db.select().from(pin).where(inArray(pin.boardId, boardIds)).all() : [],
    materials: (key) => materials.get(key),
    people: new Map(db.select({ id: user.id, name: user.name }).from(user).all().map((u) => [u.id, u.name])),
    fire: { project: p.fireRequired, room: r.fireRequired },
  };
}
