import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { board, buildUp, projectMaterial, room, surface, type Room } from "@/db/schema";

// A room's check depends on the room (its row, surfaces, openings and treatments, all written
// together and stamped by its version), its boards' panels (each board's version), the
// project's build-ups (their versions) and the project's own materials. The check is kept in
// memory under a key made of exactly those stamps, so the rooms list runs a room's check
// again only when one of them changed. Nothing is stored: a restart starts cold.

export type CheckStamps = { keyOf: (row: Room) => string };

// Three small reads per list: build-up versions, material stamps and board versions.
export function checkStamps(projectId: string): CheckStamps {
  const db = getDb();
  const buildUps = db
    .select({ id: buildUp.id, version: buildUp.version })
    .from(buildUp)
    .where(eq(buildUp.projectId, projectId))
    .all()
    .map((b) => `${b.id}@${b.version}`)
    .sort()
    .join(",");
  const materials = db
    .select({ id: projectMaterial.id, at: projectMaterial.updatedAt })
    .from(projectMaterial)
    .where(eq(projectMaterial.projectId, projectId))
    .all()
    .map((m) => `${m.id}@${m.at.getTime()}`)
    .sort()
    .join(",");
  const boards = new Map<string, string[]>();
  for (const b of db
    .select({ roomId: surface.roomId, key: surface.key, version: board.version })
    .from(board)
    .innerJoin(surface, eq(surface.id, board.surfaceId))
    .innerJoin(room, eq(room.id, surface.roomId))
    .where(eq(room.projectId, projectId))
    .all()) {
    // A board still at version 0 (made for a pin or a drawing) has never held a panel.
    if (b.version > 0) boards.set(b.roomId, [...(boards.get(b.roomId) ?? []), `${b.key}@${b.version}`]);
  }
  const shared = `${buildUps}|${materials}`;
  return { keyOf: (row) => `${row.version}@${row.updatedAt.getTime()}|${(boards.get(row.id) ?? []).sort().join(",")}|${shared}` };
}

// Least recently used entries go first once the cache is full.
export class StampedCache<V> {
  private readonly entries = new Map<string, { key: string; value: V }>();
  readonly stats = { hits: 0, misses: 0 };

  constructor(private readonly capacity: number) {}

  get(id: string, key: string, make: () => V): V {
    const found = this.entries.get(id);
    this.entries.delete(id);
    if (found && found.key === key) {
      this.stats.hits++;
      this.entries.set(id, found);
      return found.value;
    }
    this.stats.misses++;
    const value = make();
    this.entries.set(id, { key, value });
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value!);
    return value;
  }
}
