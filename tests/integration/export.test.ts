// @vitest-environment node
/**
 * Signed numbers never move: after a countersignature, a change in the engine (simulated here
 * by making computeSolution return other coefficients) must not change what the signed
 * record shows. The JSON archive and the PDF read the stored results.
 */
import { beforeAll, describe, expect, it, vi } from "vitest";
import { insertProject } from "@/db/queries/projects";
import type { Actor } from "@/lib/access/actor";
import type * as Chem from "@/lib/chem";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { buildEntryArchive } from "@/lib/export/archive";
import { htmlToPdf } from "@/lib/export/pdf";
import { printHtml } from "@/lib/export/print-html";
import { createEntry } from "@/lib/notebook/entries";
import { countersignEntry, submitEntry } from "@/lib/notebook/review";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { getDb } from "@/lib/server/database";
import { formatSignificant } from "@/lib/ui/format-number";
import { createLabWithMembers, TEST_PASSWORD } from "../support/db";
import { pdfPageTexts } from "../support/pdf-text";

const engine = vi.hoisted(() => ({ changed: false }));

vi.mock("@/lib/chem", async (importOriginal) => {
  const real = await importOriginal<typeof Chem>();
  return {
    ...real,
    computeSolution: (input: Parameters<typeof real.computeSolution>[0]) => {
      const result = real.computeSolution(input);
      if (!engine.changed) return result;
      // "A corrected parameter": every mean coefficient 10 % higher.
      return {
        ...result,
        salts: result.salts.map((s) => ({ ...s, meanGamma: s.meanGamma * 1.1 })),
      };
    },
  };
});

describe("exports of a countersigned entry", () => {
  let author: Actor;
  let supervisor: Actor;
  let entryId: string;
  let signedGamma: number;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    author = members.researcher;
    supervisor = members.supervisor;
    const project = await insertProject(getDb(), {
      labId: lab.id,
      name: "Export series",
      createdById: members.admin.userId,
    });
    const { id } = await createEntry(author, { projectId: project.id, title: "Signed NaCl bath" });
    entryId = id;
    await saveEntryContent(author, id, {
      baseRevision: 0,
      title: "Signed NaCl bath",
      content: {
        type: "doc",
        content: [
          { type: "paragraph", content: [{ type: "text", text: "Bath for the chloride series." }] },
          {
            type: "solutionBlock",
            attrs: defaultSolutionBlockInput({
              blockId: "blk-export-nacl",
              name: "NaCl 0.1 mol/kg",
              components: [{ formula: "NaCl", amount: 0.1, unit: "mol/kg" }],
            }),
          },
        ],
      },
    });
    await submitEntry(author, id);
    await countersignEntry(supervisor, id, {
      revision: 1,
      password: TEST_PASSWORD,
      meaning: "approved",
      comment: "Checked against the balance log.",
    });
    const archive = await buildEntryArchive(author, id, null, "json");
    const salts = (archive.solutions[0].results as { salts: { meanGamma: number }[] }).salts;
    signedGamma = salts[0].meanGamma;
    engine.changed = true;
  });

  it("the JSON archive carries content, stored numbers, the signature and a clean verification", async () => {
    const archive = await buildEntryArchive(author, entryId, null, "json");
    expect(archive.format).toBe("ionleaf-entry-archive/1");
    expect(archive.revision.number).toBe(1);
    expect(
      (archive.solutions[0].results as { salts: { meanGamma: number }[] }).salts[0].meanGamma,
    ).toBe(signedGamma);
    expect(archive.signatures).toEqual([
      expect.objectContaining({ signerName: supervisor.name, meaning: "approved", valid: true }),
    ]);
    expect(archive.verification).toMatchObject({ intact: true, chain: { unbroken: true } });
  });

  it("the PDF shows the stored γ±, not today's, and ends with the signature manifest", async () => {
    const archive = await buildEntryArchive(author, entryId, null, "pdf");
    const pages = await pdfPageTexts(new Uint8Array(await htmlToPdf(printHtml(archive))));
    const all = pages.join(" ");
    expect(all).toContain("Signed NaCl bath");
    expect(all).toContain(`γ±(NaCl) = ${formatSignificant(signedGamma)}`);
    expect(all).not.toContain(`γ±(NaCl) = ${formatSignificant(signedGamma * 1.1)}`);
    const last = pages.at(-1)!;
    expect(last).toContain("Signature manifest");
    expect(last).toContain(supervisor.name);
    expect(last).toContain(archive.signatures[0].contentHash);
    expect(last).toContain("verifies against the stored content");
  }, 60_000);
});
