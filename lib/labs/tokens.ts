import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A URL-safe secret for a link, and the hash we store instead of it. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
