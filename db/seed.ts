import { and, eq } from "drizzle-orm";
import { hashPassword } from "better-auth/crypto";
import type { Db } from "./client";
import { shoeboxSurfaces } from "../lib/rooms/geometry";
import { makeArray } from "../lib/board/arrays";
import { formatCode } from "../lib/board/labels";
import { account, board, buildUp, firm, membership, opening, pin, pinReply, placement, project, room, surface, treatment, user, type ProjectRole, type RoomUse } from "./schema";

// The demo scenario. Everything here is FICTIONAL: the firms, the people, the arts centre
// and its rooms are invented for the demo and resemble no real organisation or person.
// Addresses use the reserved test domain example.test.

export const DEMO_PASSWORD = "cavity-demo-2026";
export const DEMO_FIRM_ID = "demo-firm-lantern-acoustics";

export const DEMO_ACCOUNTS = [
  { key: "admin", name: "Ada Admin (fictional)", email: "admin@example.test", firm: true, admin: true },
  { key: "consultant", name: "Clara Consultant (fictional)", email: "consultant@example.test", firm: true, admin: false },
  { key: "architect", name: "Arlo Architect (fictional)", email: "architect@example.test", firm: false, admin: false },
  { key: "installer", name: "Ivo Installer (fictional)", email: "installer@example.test", firm: false, admin: false },
  { key: "client", name: "Cleo Client (fictional)", email: "client@example.test", firm: false, admin: false },
] as const;

type Key = (typeof DEMO_ACCOUNTS)[number]["key"];

const ARTS_CENTRE: { name: string; reference: string; site: string; fireRequired?: string; members: [Key, ProjectRole][] } = {
  name: "Lantern Row Arts Centre refit (fictional)",
  // An invented requirement for the demo, not taken from any code.
  fireRequired: "B-s1,d0",
  reference: "LRA-24",
  site: "Lantern Row, Eastmere (a fictional town)",
  members: [
    ["consultant", "consultant"],
    ["architect", "architect"],
    ["installer", "installer"],
    ["client", "client"],
  ],
};

const LIBRARY: typeof ARTS_CENTRE = {
  name: "Saltmarsh Library reading room (fictional)",
  reference: "SML-07",
  site: "Saltmarsh Quay, Eastmere (a fictional town)",
  members: [
    ["consultant", "consultant"],
    ["installer", "installer"],
  ],
};

type DemoOpening = { kind: "door" | "window" | "glazing" | "vent"; name: string; x: number; y: number; width: number; height: number; material: string };
type DemoRoom = {
  name: string;
  use: RoomUse;
  length: number;
  width: number;
  height: number;
  finishes: Record<string, string>;
  openings: Record<string, DemoOpening[]>;
  treatments: { surface: string; buildUp: string; area: number }[];
  /** panels laid out on an elevation board: an array of one build-up's modules */
  layouts?: { surface: string; buildUp: string; origin: { x: number; y: number }; columns: number; rows: number; gap: number }[];
  pins?: { surface: string; x: number; y: number; by: Key; body: string; replies?: { by: Key; body: string }[]; resolvedBy?: Key }[];
};

const ARTS_ROOMS: DemoRoom[] = [
  {
    name: "Rehearsal room",
    use: "music",
    length: 12,
    width: 9,
    height: 4.5,
    finishes: { "wall-a": "plaster-on-masonry", "wall-b": "concrete-block-painted", "wall-c": "plaster-on-masonry", "wall-d": "brick-painted", ceiling: "painted-concrete", floor: "timber-floor-on-joists" },
    openings: {
      "wall-b": [{ kind: "door", name: "Double door to foyer", x: 3.6, y: 0, width: 1.8, height: 2.1, material: "timber-door" }],
      "wall-d": [
        { kind: "window", name: "Window 1", x: 1.5, y: 1.2, width: 2.4, height: 1.5, material: "window-glass" },
        { kind: "window", name: "Window 2", x: 5.1, y: 1.2, width: 2.4, height: 1.5, material: "window-glass" },
      ],
    },
    treatments: [
      { surface: "wall-c", buildUp: "Bass panel, rehearsal room", area: 14.4 },
      { surface: "ceiling", buildUp: "Ceiling raft, café", area: 30 },
    ],
    layouts: [{ surface: "wall-a", buildUp: "Bass panel, rehearsal room", origin: { x: 0.55, y: 0.9 }, columns: 15, rows: 2, gap: 0.1 }],
    pins: [
      { surface: "wall-a", x: 6.2, y: 3.7, by: "architect", body: "Fire alarm sounder at 3.6 m here: keep 300 mm clear around it." },
      {
        surface: "wall-a",
        x: 1.0,
        y: 0.6,
        by: "architect",
        body: "Can the bottom row start above the skirting heater?",
        replies: [{ by: "consultant", body: "Yes: the array starts at 900 mm, clear of the heater." }],
        resolvedBy: "consultant",
      },
    ],
  },
  {
    name: "Lecture room",
    use: "speech",
    length: 14,
    width: 10,
    height: 3.2,
    finishes: { "wall-a": "plaster-on-masonry", "wall-b": "plaster-on-masonry", "wall-c": "plaster-on-masonry", "wall-d": "gypsum-board-on-studs", ceiling: "gypsum-board-ceiling", floor: "vinyl-on-concrete" },
    openings: {
      "wall-a": [{ kind: "glazing", name: "Window band", x: 1, y: 0.9, width: 12, height: 1.6, material: "glass-large-pane" }],
      "wall-b": [{ kind: "door", name: "Door to corridor", x: 0.6, y: 0, width: 1, height: 2.1, material: "timber-door" }],
    },
    treatments: [
      { surface: "wall-d", buildUp: "Slotted speech panel, lecture room", area: 14.4 },
      { surface: "ceiling", buildUp: "Ceiling raft, café", area: 40 },
    ],
    layouts: [{ surface: "wall-c", buildUp: "Slotted speech panel, lecture room", origin: { x: 0.6, y: 0.4 }, columns: 16, rows: 1, gap: 0.2 }],
    pins: [{ surface: "wall-c", x: 4.5, y: 2.95, by: "architect", body: "Align the panel tops with the window head opposite (2.5 m)?" }],
  },
  {
    name: "Café",
    use: "dining",
    length: 18,
    width: 11,
    height: 3.6,
    finishes: { "wall-a": "plaster-on-masonry", "wall-b": "plaster-on-masonry", "wall-c": "brick-unglazed", "wall-d": "plaster-on-masonry", ceiling: "painted-concrete", floor: "unpainted-concrete" },
    openings: {
      "wall-a": [{ kind: "glazing", name: "Shop front", x: 1, y: 0.2, width: 16, height: 2.6, material: "glass-large-pane" }],
      "wall-b": [{ kind: "door", name: "Door to kitchen", x: 8, y: 0, width: 1, height: 2.1, material: "timber-door" }],
    },
    treatments: [{ surface: "wall-c", buildUp: "Slotted speech panel, lecture room", area: 20 }],
    layouts: [{ surface: "ceiling", buildUp: "Ceiling raft, café", origin: { x: 0.9, y: 1.0 }, columns: 10, rows: 6, gap: 0.4 }],
    pins: [{ surface: "ceiling", x: 9, y: 5.6, by: "architect", body: "Sprinkler heads on a 3 m grid here; rafts must not cover them." }],
  },
];

const LIBRARY_ROOMS: DemoRoom[] = [
  {
    name: "Reading room",
    use: "teaching",
    length: 16,
    width: 8,
    height: 3.4,
    finishes: { "wall-a": "plaster-on-masonry", "wall-b": "plaster-on-masonry", "wall-c": "plywood-on-battens", "wall-d": "plaster-on-masonry", ceiling: "painted-concrete", floor: "carpet-heavy-on-concrete" },
    openings: { "wall-a": [{ kind: "window", name: "Windows", x: 1, y: 0.9, width: 13, height: 1.8, material: "window-glass" }] },
    treatments: [],
  },
];

// Two tuned build-ups for the arts centre (invented products; the numbers are the engine's).
const ARTS_BUILD_UPS = [
  {
    name: "Bass panel, rehearsal room",
    spec: {
      facing: { kind: "round-holes", thickness: 0.016, holeDiameter: 0.008, pitch: 0.04, grid: "square" },
      cavity: { depth: 0.2, partitioned: true },
      infill: { thickness: 0.05, flowResistivity: 10000, position: "behind-facing", model: "miki" },
      air: { temperature: 20, pressure: 101325 },
    },
    moduleWidth: 0.6,
    moduleHeight: 1.2,
    borderX: 0.04,
    borderY: 0.04,
    facingMaterial: "16 mm perforated MDF, lacquered (demo product)",
    fireStandard: "EN 13501-1" as const,
    fireClass: "B-s2,d0",
    notes: "Tuned to the 125 Hz octave, where the rehearsal room booms.",
  },
  {
    name: "Slotted speech panel, lecture room",
    spec: {
      facing: { kind: "slots", thickness: 0.016, slotWidth: 0.004, slotPitch: 0.032 },
      cavity: { depth: 0.05, partitioned: true },
      infill: { thickness: 0.04, flowResistivity: 12000, position: "behind-facing", model: "miki" },
      air: { temperature: 20, pressure: 101325 },
    },
    moduleWidth: 0.6,
    moduleHeight: 2.4,
    borderX: 0.03,
    borderY: 0.05,
    facingMaterial: "16 mm slotted timber veneer board (demo product)",
    fireStandard: "none" as const,
    fireClass: "",
    notes: "Mid-frequency absorber for the lecture room walls.",
  },
  {
    name: "Ceiling raft, café",
    spec: {
      facing: { kind: "round-holes", thickness: 0.0125, holeDiameter: 0.008, pitch: 0.018, grid: "staggered" },
      cavity: { depth: 0.1, partitioned: false },
      infill: { thickness: 0.05, flowResistivity: 10000, position: "behind-facing", model: "miki" },
      air: { temperature: 20, pressure: 101325 },
    },
    moduleWidth: 1.2,
    moduleHeight: 1.2,
    borderX: 0.05,
    borderY: 0.05,
    facingMaterial: "12.5 mm perforated gypsum board with fleece (demo product)",
    fireStandard: "EN 13501-1" as const,
    fireClass: "A2-s1,d0",
    notes: "Broadband mid-frequency raft; open plenum above.",
  },
];

export async function seedDemo(db: Db): Promise<{ created: boolean }> {
  if (db.select().from(firm).where(eq(firm.id, DEMO_FIRM_ID)).get()) return { created: false };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  db.transaction((tx) => {
    tx.insert(firm).values({ id: DEMO_FIRM_ID, name: "Lantern Acoustics Studio (fictional consultancy)" }).run();
    const ids = {} as Record<Key, string>;
    for (const a of DEMO_ACCOUNTS) {
      const id = `demo-user-${a.key}`;
      ids[a.key] = id;
      tx.insert(user)
        .values({
          id,
          name: a.name,
          email: a.email,
          emailVerified: true,
          firmId: a.firm ? DEMO_FIRM_ID : null,
          isFirmAdmin: a.admin,
          unitPreference: a.key === "installer" ? "imperial" : "metric",
        })
        .run();
      tx.insert(account).values({ id: `demo-account-${a.key}`, accountId: id, providerId: "credential", userId: id, password: passwordHash }).run();
    }
    for (const [spec, rooms] of [
      [ARTS_CENTRE, ARTS_ROOMS],
      [LIBRARY, LIBRARY_ROOMS],
    ] as const) {
      const p = tx
        .insert(project)
        .values({ firmId: DEMO_FIRM_ID, name: spec.name, reference: spec.reference, site: spec.site, fireRequired: spec.fireRequired ?? null, createdBy: ids.consultant })
        .returning()
        .get();
      for (const [key, role] of spec.members) tx.insert(membership).values({ projectId: p.id, userId: ids[key], role }).run();
      const buildUpIds = new Map<string, string>();
      if (spec === ARTS_CENTRE) {
        for (const b of ARTS_BUILD_UPS) {
          const row = tx.insert(buildUp).values({ projectId: p.id, ...b, spec: JSON.stringify(b.spec) }).returning().get();
          buildUpIds.set(b.name, row.id);
        }
      }
      for (const r of rooms) {
        const made = tx
          .insert(room)
          .values({ projectId: p.id, name: r.name, use: r.use, shape: "shoebox", length: r.length, width: r.width, height: r.height, volume: r.length * r.width * r.height, temperature: 20, humidity: 50 })
          .returning()
          .get();
        shoeboxSurfaces(r).forEach((shape, position) => {
          const row = tx.insert(surface).values({ roomId: made.id, ...shape, finish: r.finishes[shape.key], position }).returning().get();
          (r.openings[shape.key] ?? []).forEach((o, i) => tx.insert(opening).values({ surfaceId: row.id, ...o, position: i }).run());
        });
        for (const t of r.treatments) {
          tx.insert(treatment).values({ roomId: made.id, surfaceKey: t.surface, buildUpId: buildUpIds.get(t.buildUp)!, area: t.area }).run();
        }
        const boardOf = new Map<string, string>();
        const boardFor = (key: string) => {
          if (!boardOf.has(key)) {
            const s = tx.select({ id: surface.id }).from(surface).where(and(eq(surface.roomId, made.id), eq(surface.key, key))).get()!;
            boardOf.set(key, tx.insert(board).values({ surfaceId: s.id, version: 1 }).returning().get().id);
          }
          return boardOf.get(key)!;
        };
        for (const l of r.layouts ?? []) {
          const spec = ARTS_BUILD_UPS.find((b) => b.name === l.buildUp)!;
          const rects = makeArray({ origin: l.origin, width: spec.moduleWidth, height: spec.moduleHeight, columns: l.columns, rows: l.rows, gapX: l.gap, gapY: l.gap });
          rects.forEach((rect, i) =>
            tx.insert(placement).values({ boardId: boardFor(l.surface), buildUpId: buildUpIds.get(l.buildUp)!, code: formatCode(i + 1), ...rect, position: i }).run(),
          );
        }
        (r.pins ?? []).forEach((p, i) => {
          const made_ = tx
            .insert(pin)
            .values({ boardId: boardFor(p.surface), number: i + 1, x: p.x, y: p.y, body: p.body, authorId: ids[p.by], resolvedAt: p.resolvedBy ? new Date() : null, resolvedBy: p.resolvedBy ? ids[p.resolvedBy] : null })
            .returning()
            .get();
          for (const reply of p.replies ?? []) tx.insert(pinReply).values({ pinId: made_.id, body: reply.body, authorId: ids[reply.by] }).run();
        });
      }
    }
  });
  return { created: true };
}
