import { hashPassword } from "better-auth/crypto";
import { getDb } from "@/db/client";
import { account, firm, membership, project, room, user, type ProjectRole } from "@/db/schema";

// Per-test data, made directly in the temporary database. Passwords are real hashes so
// sign-in goes through better-auth for real.
export const TEST_PASSWORD = "test-password-123";
let passwordHash: string | null = null;
let n = 0;
const next = () => `${Date.now().toString(36)}-${(n++).toString(36)}`;

export function makeFirm(name = "Test firm (fictional)") {
  return getDb().insert(firm).values({ name }).returning().get();
}

export async function makeUser(opts: { firmId?: string | null; isFirmAdmin?: boolean; email?: string; name?: string } = {}) {
  passwordHash ??= await hashPassword(TEST_PASSWORD);
  const id = `u-${next()}`;
  const email = opts.email ?? `${id}@example.test`;
  const row = getDb()
    .insert(user)
    .values({ id, name: opts.name ?? `Person ${id} (fictional)`, email, emailVerified: true, firmId: opts.firmId ?? null, isFirmAdmin: opts.isFirmAdmin ?? false })
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
