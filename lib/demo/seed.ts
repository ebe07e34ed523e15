import "server-only";
import type { Database } from "@/db/client";
import { insertAuditEvent } from "@/db/queries/audit";
import { findLabBySlug, insertLab } from "@/db/queries/labs";
import { insertUser } from "@/db/queries/users";
import { projects } from "@/db/schema";
import { hashPassword } from "@/lib/auth/password";
import { DEMO_LABS, DEMO_PASSWORD } from "./scenario";

export interface SeedHooks {
  /** Demo notebook content for a lab, run after the lab, its members and projects are committed. */
  afterLab?: (lab: { id: string; slug: string }) => Promise<void>;
}

/** Seeds the demo scenario once; labs that already exist are left exactly as they are. */
export async function seedDemo(
  db: Database,
  hooks: SeedHooks = {},
): Promise<{ created: string[]; skipped: string[] }> {
  const created: string[] = [];
  const skipped: string[] = [];
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const demo of DEMO_LABS) {
    if (await findLabBySlug(db, demo.slug)) {
      skipped.push(demo.slug);
      continue;
    }
    const lab = await db.transaction(async (tx) => {
      const lab = await insertLab(tx, { slug: demo.slug, name: demo.name });
      const memberIds: Record<string, string> = {};
      for (const m of demo.members) {
        const user = await insertUser(tx, {
          labId: lab.id,
          email: m.email,
          name: m.name,
          role: m.role,
          passwordHash,
        });
        memberIds[m.email] = user.id;
      }
      const creator =
        memberIds[
          demo.members.find((m) => m.role === "supervisor")?.email ?? demo.members[0].email
        ];
      for (const p of demo.projects) {
        await tx.insert(projects).values({
          labId: lab.id,
          name: p.name,
          description: p.description,
          createdById: creator,
        });
      }
      await insertAuditEvent(tx, {
        labId: lab.id,
        actorId: null,
        action: "lab.seeded",
        targetType: "lab",
        targetId: lab.id,
      });
      return lab;
    });
    if (hooks.afterLab) await hooks.afterLab({ id: lab.id, slug: lab.slug });
    created.push(demo.slug);
  }
  return { created, skipped };
}
