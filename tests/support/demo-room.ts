/**
 * The demo scenario's rooms as snapshot sources, through a real temporary SQLite database:
 * migrated, seeded with the demo data (db/seed.ts), and read back row by row the way a service
 * will. The required fire class is not stored yet (stage 2 adds it), so callers pass it.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { and, eq, inArray } from "drizzle-orm";
import { openDatabase, type Db } from "@/db/client";
import { seedDemo } from "@/db/seed";
import { board, buildUp, firm, opening, pin, placement, project, projectMaterial, room, surface, treatment, user } from "@/db/schema";
import { MATERIALS } from "@/lib/rooms/materials-library";
import type { MaterialInfo, SnapshotSource } from "@/lib/submittals";

export const DEMO_PROJECT = "LRA-24";

export function roomRows(db: Db, projectReference: string, roomName: string): Omit<SnapshotSource, "fire" | "revision" | "consultant"> {
  const p = db.select().from(project).where(eq(project.reference, projectReference)).get();
  if (!p) throw new Error(`No project ${projectReference}`);
  const r = db.select().from(room).where(and(eq(room.projectId, p.id), eq(room.name, roomName))).get();
  if (!r) throw new Error(`No room ${roomName}`);
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
  };
}

/** A seeded demo database in a temporary folder; `close` removes it. */
export async function demoDatabase(): Promise<{ db: Db; close: () => void }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "cavitas-demo-"));
  const { db, sqlite } = openDatabase(path.join(dir, "demo.sqlite"));
  await seedDemo(db);
  return {
    db,
    close: () => {
      sqlite.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** The rehearsal room of the demo arts centre as revision A, issued by the demo consultant. */
export async function demoRehearsalSource(): Promise<SnapshotSource> {
  const { db, close } = await demoDatabase();
  try {
    const consultant = db.select().from(user).where(eq(user.email, "consultant@example.test")).get()!;
    const consultancy = db.select().from(firm).where(eq(firm.id, consultant.firmId!)).get();
    return {
      ...roomRows(db, DEMO_PROJECT, "Rehearsal room"),
      fire: { project: "B-s1,d0", room: null },
      consultant: { name: consultant.name, firm: consultancy?.name ?? null, email: consultant.email },
      revision: { letter: "A", issuedAt: "2026-03-02T10:15:00Z" },
    };
  } finally {
    close();
  }
}
