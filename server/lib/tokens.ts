import { randomBytes, createHash } from "node:crypto";

/** A random, URL-safe token of 256 bits, and the only form of it we store: its SHA-256. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
