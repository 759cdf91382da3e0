import crypto from "node:crypto";

// Invitation tokens: 32 random bytes in the link, only their SHA-256 in the database.
export function newToken(): string {
  return crypto.randomBytes(32).toString("base64url");
}

export function hashToken(token: string): string {
  return crypto.createHash("sha256").update(token).digest("hex");
}
