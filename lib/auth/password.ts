import "server-only";
import argon2 from "argon2";

// argon2id with the library's defaults (m = 64 MiB, t = 3, p = 4), the OWASP-recommended
// family for password storage.
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id });
}

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false; // a malformed stored hash never signs anyone in
  }
}

// Verifying against a fixed hash when the address is unknown keeps the time of a failed
// sign-in the same whether or not the e-mail exists.
let decoyHash: Promise<string> | null = null;
export async function verifyDecoy(password: string): Promise<false> {
  decoyHash ??= hashPassword("ionleaf-decoy-password-never-used");
  await verifyPassword(await decoyHash, password);
  return false;
}
