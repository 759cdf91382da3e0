/**
 * The demo scenario's rooms as snapshot sources, through a real temporary SQLite database:
 * migrated, seeded with the demo data (db/seed.ts), and read back row by row the way a service
 * will (db/queries/room-rows.ts). The demo's required fire class is given here.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { and, eq } from "drizzle-orm";
import { openDatabase, type Db } from "@/db/client";
import { seedDemo } from "@/db/seed";
import { firm, project, room, user } from "@/db/schema";
import { roomRows } from "@/db/queries/room-rows";
import type { SnapshotSource } from "@/lib/submittals";

export const DEMO_PROJECT = "LRA-24";

/** The rows of a room of the demo scenario, by project reference and room name (db/queries/room-rows.ts). */
export function demoRoomRows(db: Db, projectReference: string, roomName: string): Omit<SnapshotSource, "fire" | "revision" | "consultant"> {
  const p = db.select().from(project).where(eq(project.reference, projectReference)).get();
  if (!p) throw new Error(`No project ${projectReference}`);
  const r = db.select().from(room).where(and(eq(room.projectId, p.id), eq(room.name, roomName))).get();
  if (!r) throw new Error(`No room ${roomName}`);
  const { fire: _fire, ...rows } = roomRows(db, p.id, r.id)!;
  return rows;
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
      ...demoRoomRows(db, DEMO_PROJECT, "Rehearsal room"),
      fire: { project: "B-s1,d0", room: null },
      consultant: { name: consultant.name, firm: consultancy?.name ?? null, email: consultant.email },
      revision: { letter: "A", issuedAt: "2026-03-02T10:15:00Z" },
    };
  } finally {
    close();
  }
}
