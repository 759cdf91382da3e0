import { eq } from "drizzle-orm";
import { hashPassword } from "better-auth/crypto";
import type { Db } from "./client";
import { account, buildUp, firm, membership, project, room, user, type ProjectRole, type RoomUse } from "./schema";

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

const ARTS_CENTRE: { name: string; reference: string; site: string; members: [Key, ProjectRole][] } = {
  name: "Lantern Row Arts Centre refit (fictional)",
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

const ARTS_ROOMS: { name: string; use: RoomUse; length: number; width: number; height: number }[] = [
  { name: "Rehearsal room", use: "music", length: 12, width: 9, height: 4.5 },
  { name: "Lecture room", use: "speech", length: 14, width: 10, height: 3.2 },
  { name: "Café", use: "dining", length: 18, width: 11, height: 3.6 },
];

const LIBRARY_ROOMS: typeof ARTS_ROOMS = [{ name: "Reading room", use: "teaching", length: 16, width: 8, height: 3.4 }];

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
        .values({ firmId: DEMO_FIRM_ID, name: spec.name, reference: spec.reference, site: spec.site, createdBy: ids.consultant })
        .returning()
        .get();
      for (const [key, role] of spec.members) tx.insert(membership).values({ projectId: p.id, userId: ids[key], role }).run();
      if (spec === ARTS_CENTRE) {
        for (const b of ARTS_BUILD_UPS) tx.insert(buildUp).values({ projectId: p.id, ...b, spec: JSON.stringify(b.spec) }).run();
      }
      for (const r of rooms) {
        tx.insert(room)
          .values({ projectId: p.id, ...r, volume: r.length * r.width * r.height, temperature: 20, humidity: 50 })
          .run();
      }
    }
  });
  return { created: true };
}
