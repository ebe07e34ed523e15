// @vitest-environment node
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { blockResults, entries, labs, solutionParents } from "@/db/schema";
import { demoContent } from "@/lib/demo/content";
import { DEMO_LABS, DEMO_PASSWORD } from "@/lib/demo/scenario";
import { seedDemo } from "@/lib/demo/seed";
import { verifyCredentials } from "@/lib/auth/verify-credentials";
import { getDb } from "@/lib/server/database";

/** What lib/demo/content.ts writes for each lab: entries, and solution block rows over all revisions. */
const EXPECTED: Record<string, { entries: number; solutions: number }> = {
  "saltmarsh-interfaces": { entries: 5, solutions: 6 },
  "ridgeback-cells": { entries: 1, solutions: 1 },
};

describe("demo scenario seed", () => {
  it("creates two labs with members in every role and notebook content, once", async () => {
    const first = await seedDemo(getDb(), { afterLab: demoContent });
    expect(first.created.sort()).toEqual(DEMO_LABS.map((l) => l.slug).sort());
    const again = await seedDemo(getDb(), { afterLab: demoContent });
    expect(again.created).toEqual([]);
    expect(again.skipped.sort()).toEqual(DEMO_LABS.map((l) => l.slug).sort());

    for (const lab of DEMO_LABS) {
      expect(new Set(lab.members.map((m) => m.role))).toEqual(
        new Set(["admin", "supervisor", "researcher"]),
      );
      const signIn = await verifyCredentials(getDb(), {
        email: lab.members[0].email,
        password: DEMO_PASSWORD,
      });
      expect(signIn.kind).toBe("ok");
      const [row] = await getDb().select().from(labs).where(eq(labs.slug, lab.slug));
      const labEntries = await getDb().select().from(entries).where(eq(entries.labId, row.id));
      expect(labEntries).toHaveLength(EXPECTED[lab.slug].entries);
      const labSolutions = await getDb()
        .select()
        .from(blockResults)
        .where(eq(blockResults.labId, row.id));
      expect(labSolutions).toHaveLength(EXPECTED[lab.slug].solutions);
      if (lab.slug === "saltmarsh-interfaces") {
        // The review states a new user should see: signed, returned, an amendment under
        // review, and a draft.
        const byTitle = Object.fromEntries(labEntries.map((e) => [e.title, e]));
        expect(byTitle["Mixed chloride–sulfate electrolyte at I = 0.3 mol/kg"]).toMatchObject({
          status: "countersigned",
          signedRevisionNumber: 1,
        });
        expect(byTitle["Cu disc in 0.1 m NaCl with 1 mM CuCl₂ — polarisation run 1"].status).toBe(
          "returned",
        );
        expect(byTitle["KCl stock for the reference compartment"]).toMatchObject({
          status: "submitted",
          signedRevisionNumber: 1,
          currentRevisionNumber: 2,
        });
        expect(byTitle["Hexacyanoferrate couple on glassy carbon, 5 mM"].status).toBe("draft");
        // A dilution of the KCl stock's countersigned revision 1, so the stock list is not empty
        // and the notice of the stock's newer revision (the amendment) shows.
        const links = await getDb()
          .select()
          .from(solutionParents)
          .where(eq(solutionParents.labId, row.id));
        expect(links).toHaveLength(1);
        expect(links[0]).toMatchObject({
          entryId: byTitle["0.1 mol/L KCl supporting electrolyte"].id,
          parentEntryId: byTitle["KCl stock for the reference compartment"].id,
          parentRevision: 1,
          volumeMl: 10,
          finalVolumeMl: 300,
        });
      }
    }
  });
});
