import { hashPassword } from "better-auth/crypto";
import { getDb } from "@/db/client";
import { account, attachment, buildUp, firm, membership, project, room, user, type ProjectRole } from "@/db/schema";
import { storeFile } from "@/lib/storage";

// Per-test data, made directly in the temporary database. Passwords are real hashes so
// sign-in goes through better-auth for real.
export const TEST_PASSWORD = "test-password-123";
let passwordHash: string | null = null;
let n = 0;
const next = () => `${Date.now().toString(36)}-${(n++).toString(36)}`;

export function makeFirm(name = "Test firm (fictional)") {
  return getDb().insert(firm).values({ name }).returning().get();
}

export async function makeUser(opts: { firmId?: string | null; isFirmAdmin?: boolean; email?: string; name?: string; unitPreference?: "metric" | "imperial" } = {}) {
  passwordHash ??= await hashPassword(TEST_PASSWORD);
  const id = `u-${next()}`;
  const email = opts.email ?? `${id}@example.test`;
  const row = getDb()
    .insert(user)
    .values({ id, name: opts.name ?? `Person ${id} (fictional)`, email, emailVerified: true, firmId: opts.firmId ?? null, isFirmAdmin: opts.isFirmAdmin ?? false, unitPreference: opts.unitPreference ?? "metric" })
    .returning()
    .get();
  getDb().insert(account).values({ id: `a-${id}`, accountId: id, providerId: "credential", userId: id, password: passwordHash }).run();
  return row;
}

export function makeProject(firmId: string, name = "Test project (fictional)") {
  const p = getDb().insert(project).values({ firmId, name, reference: "T-1" }).returning().get();
  getDb().insert(room).values({ projectId: p.id, name: "Test room", use: "speech", length: 10, width: 8, height: 3, volume: 240 }).run();
  return p;
}

export function addMember(projectId: string, userId: string, role: ProjectRole) {
  return getDb().insert(membership).values({ projectId, userId, role }).returning().get();
}

export const uniqueEmail = (prefix = "guest") => `${prefix}-${next()}@example.test`;

export const SPEC = {
  facing: { kind: "round-holes", thickness: 0.016, holeDiameter: 0.008, pitch: 0.04, grid: "square" },
  cavity: { depth: 0.2, partitioned: true },
  infill: null,
  air: { temperature: 20, pressure: 101325 },
} as const;

export function makeBuildUp(projectId: string, name = "Test build-up") {
  return getDb()
    .insert(buildUp)
    .values({ projectId, name, spec: JSON.stringify(SPEC), moduleWidth: 0.6, moduleHeight: 1.2 })
    .returning()
    .get();
}

// The smallest file that starts like a PDF; storage checks content, not names.
export const TINY_PDF = new TextEncoder().encode("%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n");
export const TINY_PNG = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0]);

export function makeAttachment(projectId: string, purpose: "fire-report" | "test-report" | "drawing" | "photo" = "fire-report") {
  const stored = storeFile(purpose === "photo" ? TINY_PNG : TINY_PDF, ["pdf", "png"]);
  return getDb()
    .insert(attachment)
    .values({ projectId, purpose, sha256: stored.sha256, mime: stored.mime, size: stored.size, originalName: "report.pdf" })
    .returning()
    .get();
}
