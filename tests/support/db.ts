import { randomUUID } from "node:crypto";
import type { Role } from "@/db/schema/enums";
import { insertLab } from "@/db/queries/labs";
import { insertUser } from "@/db/queries/users";
import type { Actor } from "@/lib/access/actor";
import { hashPassword } from "@/lib/auth/password";
import { createDatabase, type Database } from "@/db/client";
import { getDb } from "@/lib/server/database";

export const TEST_PASSWORD = "test-password-9";

let cachedHash: string | null = null;

/** A fresh lab with one member per requested role; unique names so files never collide. */
export async function createLabWithMembers(roles: Role[] = ["admin", "supervisor", "researcher"]) {
  cachedHash ??= await hashPassword(TEST_PASSWORD);
  const tag = randomUUID().slice(0, 8);
  const db = getDb();
  const lab = await insertLab(db, { name: `Test lab ${tag}`, slug: `test-${tag}` });
  const members: Record<string, Actor> = {};
  for (const [i, role] of roles.entries()) {
    const email = `${role}${i}.${tag}@lab.example`;
    const user = await insertUser(db, {
      labId: lab.id,
      email,
      name: `${role} ${i} ${tag}`,
      role,
      passwordHash: cachedHash,
    });
    members[i === roles.indexOf(role) ? role : `${role}${i}`] = {
      userId: user.id,
      labId: lab.id,
      role,
      name: user.name,
      email,
    };
  }
  return { lab, members, tag };
}

let owner: Database | null = null;

/**
 * The database as the owner of its tables (migrations, VACUUM, the guard triggers' own
 * tests). The app and the tests' services connect as the app role, which may do less.
 */
export function ownerDb(): Database {
  const url = process.env.DATABASE_OWNER_URL;
  if (!url) throw new Error("DATABASE_OWNER_URL is not set: run the tests through npm test");
  owner ??= createDatabase(url, 2).db;
  return owner;
}

/** The mail catcher's inbox, from the test harness's catcher. */
export async function caughtMessagesTo(address: string) {
  const base = process.env.MAIL_CATCHER_URL;
  if (!base) throw new Error("MAIL_CATCHER_URL is not set: run the tests through npm test");
  const response = await fetch(new URL("/messages", base));
  const all = (await response.json()) as { to: string[]; subject: string; text: string }[];
  return all.filter((m) => m.to.includes(address));
}
