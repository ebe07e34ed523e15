import { eq } from "drizzle-orm";
import type { Executor } from "../client";
import { labs, type NewLab } from "../schema";

export async function insertLab(db: Executor, lab: NewLab) {
  const rows = await db.insert(labs).values(lab).returning();
  return rows[0];
}

export async function findLabById(db: Executor, id: string) {
  const rows = await db.select().from(labs).where(eq(labs.id, id)).limit(1);
  return rows[0] ?? null;
}

export async function findLabBySlug(db: Executor, slug: string) {
  const rows = await db.select().from(labs).where(eq(labs.slug, slug)).limit(1);
  return rows[0] ?? null;
}
