/**
 * Plain rows, shaped as db/schema defines them, for a small fictional room: what a service would
 * load from the database before calling buildSnapshot. Sizes are chosen so the expected values
 * can be worked by hand in the tests.
 */
import type { BuildUp, Opening, Pin, Placement, Room, Surface, Treatment } from "@/db/schema";
import { shoeboxSurfaces } from "@/lib/rooms/geometry";
import { findMaterial } from "@/lib/rooms/materials-library";
import type { SnapshotSource } from "@/lib/submittals";

const AT = new Date("2026-03-02T09:00:00Z");

// The demo bass panel: Ø8 mm holes at 40 mm, square, 16 mm plate, 200 mm partitioned cavity.
export const BASS_SPEC = {
  facing: { kind: "round-holes", thickness: 0.016, holeDiameter: 0.008, pitch: 0.04, grid: "square" },
  cavity: { depth: 0.2, partitioned: true },
  infill: { thickness: 0.05, flowResistivity: 10000, position: "behind-facing", model: "miki" },
  air: { temperature: 20, pressure: 101325 },
};

export const SLOT_SPEC = {
  facing: { kind: "slots", thickness: 0.016, slotWidth: 0.004, slotPitch: 0.032 },
  cavity: { depth: 0.05, partitioned: true },
  infill: { thickness: 0.04, flowResistivity: 12000, position: "behind-facing", model: "miki" },
  air: { temperature: 20, pressure: 101325 },
};

export function buildUpRow(over: Partial<BuildUp> & { id: string; name: string; spec: string }): BuildUp {
  return {
    projectId: "p1",
    moduleWidth: 0.6,
    moduleHeight: 1.2,
    borderX: 0.04,
    borderY: 0.04,
    facingMaterial: "16 mm perforated board (fictional product)",
    fireStandard: "EN 13501-1",
    fireClass: "B-s2,d0",
    fireReportId: null,
    notes: "",
    version: 1,
    createdAt: AT,
    updatedAt: AT,
    ...over,
  };
}

export function placementRow(boardId: string, code: string, buildUpId: string, rect: { x: number; y: number; width?: number; height?: number }, position: number): Placement {
  return { id: `pl-${boardId}-${code}`, boardId, buildUpId, code, x: rect.x, y: rect.y, width: rect.width ?? 0.6, height: rect.height ?? 1.2, position };
}

/**
 * A 6 × 4 × 3 m music room: a door on wall B; three bass panels on wall A (one whose top, at
 * 2.7 m, is above the 2.4 m high-level line); slotted panels treated by area on the ceiling
 * (10 m²); one open pin and one resolved pin on wall A.
 */
export function smallRoomSource(): SnapshotSource {
  const room: Room = {
    id: "r1",
    projectId: "p1",
    name: "Practice room (fictional)",
    use: "music",
    length: 6,
    width: 4,
    height: 3,
    volume: 72,
    shape: "shoebox",
    temperature: 20,
    humidity: 50,
    pressure: 101325,
    target: null,
    fireRequired: null,
    version: 3,
    createdAt: AT,
    updatedAt: AT,
  };
  const finishes: Record<string, string> = { "wall-a": "plaster-on-masonry", "wall-b": "plaster-on-masonry", "wall-c": "plaster-on-masonry", "wall-d": "plaster-on-masonry", ceiling: "painted-concrete", floor: "timber-floor-on-joists" };
  const surfaces: Surface[] = shoeboxSurfaces({ length: 6, width: 4, height: 3 }).map((s, position) => ({ id: `s-${s.key}`, roomId: "r1", ...s, finish: finishes[s.key], position, createdAt: AT }));
  const openings: Opening[] = [{ id: "o1", surfaceId: "s-wall-b", kind: "door", name: "Door to hall", x: 1, y: 0, width: 1, height: 2.1, material: "timber-door", position: 0, createdAt: AT }];
  const treatments: Treatment[] = [{ id: "t1", roomId: "r1", surfaceKey: "ceiling", buildUpId: "bu-slot", area: 10, createdAt: AT }];
  const buildUps = [
    buildUpRow({ id: "bu-bass", name: "Bass panel", spec: JSON.stringify(BASS_SPEC) }),
    buildUpRow({ id: "bu-slot", name: "Slotted panel", spec: JSON.stringify(SLOT_SPEC), moduleHeight: 2.4, borderX: 0.03, borderY: 0.05, fireStandard: "none", fireClass: "" }),
    buildUpRow({ id: "bu-unused", name: "Unused panel", spec: JSON.stringify(BASS_SPEC) }),
  ];
  const placements = [
    placementRow("b-wall-a", "P-001", "bu-bass", { x: 0.5, y: 0.9 }, 0),
    placementRow("b-wall-a", "P-002", "bu-bass", { x: 1.2, y: 0.9 }, 1),
    placementRow("b-wall-a", "P-003", "bu-bass", { x: 1.9, y: 1.5 }, 2),
  ];
  const pins: Pin[] = [
    { id: "pin1", boardId: "b-wall-a", number: 1, x: 3, y: 2.5, body: "Smoke detector above: keep clear.", authorId: "u-arch", resolvedAt: null, resolvedBy: null, createdAt: AT },
    { id: "pin2", boardId: "b-wall-a", number: 2, x: 1, y: 0.5, body: "Resolved already.", authorId: "u-arch", resolvedAt: AT, resolvedBy: "u-cons", createdAt: AT },
  ];
  return {
    project: { id: "p1", name: "Test hall refit (fictional)", reference: "THR-1", site: "Nowhere Lane (fictional)", edgeClearance: 0.05 },
    room,
    surfaces,
    openings,
    treatments,
    buildUps,
    boards: [{ id: "b-wall-a", surfaceId: "s-wall-a" }],
    placements,
    pins,
    materials: (key) => {
      const m = findMaterial(key);
      return m ? { name: m.name, alpha: m.alpha, source: m.source } : undefined;
    },
    fire: { project: "B-s1,d0", room: null },
    consultant: { name: "Casey Consultant (fictional)", firm: "Test Acoustics (fictional)", email: "consultant@example.test" },
    revision: { letter: "A", issuedAt: "2026-03-02T10:15:00Z" },
    people: new Map([["u-arch", "Alex Architect (fictional)"]]),
  };
}
