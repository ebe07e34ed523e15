import "server-only";
import { eq } from "drizzle-orm";
import { users } from "@/db/schema";
import type { Actor } from "@/lib/rules/authorize";
import { defaultCellBlockInput, defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { createEntry } from "@/lib/notebook/entries";
import { countersignEntry, returnEntry, startAmendment, submitEntry } from "@/lib/notebook/review";
import { DEMO_PASSWORD } from "./scenario";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { listProjects } from "@/lib/projects/service";
import { getDb } from "@/lib/server/database";

/**
 * Demo notebook pages for a freshly seeded lab, written through the same services a
 * researcher's browser uses (so the solution rows are the server's own recomputation).
 * The people, projects and experiments are invented.
 */
const text = (value: string) => ({ type: "text", text: value });
const paragraph = (value: string) => ({ type: "paragraph", content: [text(value)] });
const heading = (value: string) => ({
  type: "heading",
  attrs: { level: 2 },
  content: [text(value)],
});
const solution = (attrs: SolutionBlockInput) => ({ type: "solutionBlock", attrs });

async function actorsOf(labId: string): Promise<Record<string, Actor>> {
  const rows = await getDb().select().from(users).where(eq(users.labId, labId));
  return Object.fromEntries(
    rows.map((u) => [
      u.email,
      { userId: u.id, labId: u.labId, role: u.role, name: u.name, email: u.email },
    ]),
  );
}

async function write(
  actor: Actor,
  projectName: string,
  title: string,
  nodes: unknown[] | { template: string },
  submit = false,
) {
  const project = (await listProjects(actor)).find((p) => p.name === projectName);
  if (!project) throw new Error(`demo project missing: ${projectName}`);
  if (!Array.isArray(nodes)) {
    const { id } = await createEntry(actor, {
      projectId: project.id,
      title,
      template: nodes.template,
    });
    if (submit) await submitEntry(actor, id);
    return id;
  }
  const { id } = await createEntry(actor, { projectId: project.id, title });
  await saveEntryContent(actor, id, {
    baseRevision: 0,
    title,
    content: { type: "doc", content: nodes },
  });
  if (submit) await submitEntry(actor, id);
  return id;
}

async function saltmarsh(labId: string) {
  const a = await actorsOf(labId);
  const tobin = a["tobin.bench@saltmarsh.example"];
  const mira = a["mira.bench@saltmarsh.example"];
  const odile = a["odile.pi@saltmarsh.example"];

  const copperBath = defaultSolutionBlockInput({
    name: "0.1 mol/kg NaCl with 1 mmol/kg CuCl₂",
    components: [
      { formula: "NaCl", amount: 0.1, unit: "mol/kg" },
      { formula: "CuCl2·2H2O", amount: 0.001, unit: "mol/kg" },
    ],
  });
  const copperCell = defaultCellBlockInput({
    name: "Cu disc, three-electrode cell",
    electrolyteBlockId: copperBath.blockId,
    couple: "Cu2+/Cu",
    workingElectrode: {
      material: "copper disc (99.99 %)",
      areaCm2: 0.196,
      pretreatment: ["SiC 1200 then 2400 grit", "rinse in water and ethanol, dry under N₂"],
    },
    counterElectrode: { material: "Pt mesh", areaCm2: null, pretreatment: [] },
    referenceElectrode: {
      material: "saturated calomel",
      areaCm2: null,
      pretreatment: [],
      type: "SCE",
    },
    purgeMinutes: 20,
    instrument: "bench potentiostat A",
    channel: "1",
  });
  const copperRun = await write(
    tobin,
    "Copper corrosion in chloride media",
    "Cu disc in 0.1 m NaCl with 1 mM CuCl₂ — polarisation run 1",
    [
      heading("Electrolyte"),
      solution(copperBath),
      heading("Cell"),
      { type: "cellBlock", attrs: copperCell },
      paragraph(
        "Open-circuit potential for 30 min, then a slow linear sweep from −250 mV to +250 mV about it at 0.167 mV/s.",
      ),
    ],
    true,
  );
  await returnEntry(odile, copperRun, {
    revision: 1,
    comment: "Record the grit paper lot and the drift you accepted before starting the sweep.",
  });

  const mixed = defaultSolutionBlockInput({
    name: "Chloride–sulfate mix, I ≈ 0.3",
    components: [
      { formula: "NaCl", amount: 0.1, unit: "mol/kg" },
      { formula: "Na2SO4", amount: 0.0667, unit: "mol/kg" },
    ],
  });
  const mixedEntry = await write(
    tobin,
    "Copper corrosion in chloride media",
    "Mixed chloride–sulfate electrolyte at I = 0.3 mol/kg",
    [
      heading("Aim"),
      paragraph(
        "Hold the ionic strength near 0.3 mol/kg while the chloride fraction changes, so that activity effects do not masquerade as a chloride effect.",
      ),
      solution(mixed),
      paragraph("Weighed on the analytical balance; dissolved in 18 MΩ·cm water."),
    ],
    true,
  );
  await countersignEntry(odile, mixedEntry, {
    revision: 1,
    password: DEMO_PASSWORD,
    meaning: "approved",
    comment: "Masses agree with the balance printout.",
  });

  const redox = defaultSolutionBlockInput({
    name: "Ferri/ferro 5 mM in 1 M KCl",
    components: [
      { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
      { formula: "K4Fe(CN)6", amount: 5, unit: "mmol/L" },
      { formula: "KCl", amount: 1, unit: "mol/L" },
    ],
  });
  const cell = defaultCellBlockInput({
    name: "Glassy carbon RDE cell",
    electrolyteBlockId: redox.blockId,
    couple: "Fe(CN)6 3-/4-",
    workingElectrode: {
      material: "glassy carbon disc",
      areaCm2: 0.0707,
      pretreatment: ["0.05 µm alumina polish, 2 min", "sonicate in water, 5 min"],
    },
    counterElectrode: { material: "Pt coil", areaCm2: null, pretreatment: ["flame-annealed"] },
    referenceElectrode: {
      material: "Ag/AgCl",
      areaCm2: null,
      pretreatment: [],
      type: "Ag/AgCl-3MKCl",
    },
    purgeMinutes: 15,
    instrument: "bench potentiostat B",
    channel: "2",
  });
  await write(mira, "Ferrocyanide kinetics", "Hexacyanoferrate couple on glassy carbon, 5 mM", [
    heading("Electrolyte"),
    solution(redox),
    heading("Cell"),
    { type: "cellBlock", attrs: cell },
    paragraph(
      "Hexacyanoferrates release hydrogen cyanide with strong acid: keep acids away from these solutions.",
    ),
  ]);
  const filling = defaultSolutionBlockInput({
    name: "3 mol/L KCl filling solution",
    temperatureC: 22,
    components: [{ formula: "KCl", amount: 22.37, unit: "g", perAmount: 100, perUnit: "mL" }],
  });
  const fillingNodes = (flaskMl: number) => [
    heading("Recipe"),
    paragraph(
      `22.37 g KCl (dried 2 h at 110 °C) made up to ${flaskMl} mL in a class A flask at 22 °C.`,
    ),
    solution({ ...filling, components: [{ ...filling.components[0], perAmount: flaskMl }] }),
    heading("Use"),
    paragraph(
      "Fills the Ag/AgCl (3 mol/L KCl) reference electrodes of the ferrocyanide cells; replaced monthly.",
    ),
  ];
  const stock = await write(
    mira,
    "Ferrocyanide kinetics",
    "KCl stock for the reference compartment",
    fillingNodes(100),
    true,
  );
  await countersignEntry(odile, stock, {
    revision: 1,
    password: DEMO_PASSWORD,
    meaning: "witnessed",
    comment: "",
  });
  // A working electrolyte diluted from the countersigned stock (revision 1); the amendment below
  // then gives the stock a newer revision, so this entry shows the notice offering to update.
  await write(mira, "Ferrocyanide kinetics", "0.1 mol/L KCl supporting electrolyte", [
    paragraph("10.00 mL of the 3 mol/L KCl stock (volumetric pipette) made up to 300 mL."),
    solution(
      defaultSolutionBlockInput({
        name: "0.1 mol/L KCl from the stock",
        temperatureC: 22,
        components: [],
        dilution: {
          stocks: [
            { entryId: stock, blockId: filling.blockId, revision: 1, volume: 10, volumeUnit: "mL" },
          ],
          finalVolume: 300,
          finalVolumeUnit: "mL",
        },
      }),
    ),
  ]);
  // Amended after countersignature: the flask was recalibrated; the amendment waits for review.
  await startAmendment(mira, stock, {
    reason: "The 100 mL flask was recalibrated at 99.82 mL; the concentration is corrected.",
  });
  await saveEntryContent(mira, stock, {
    baseRevision: 1,
    title: "KCl stock for the reference compartment",
    content: { type: "doc", content: fillingNodes(99.82) },
  });
  await submitEntry(mira, stock);
}

async function ridgeback(labId: string) {
  const a = await actorsOf(labId);
  const juno = a["juno.bench@ridgeback.example"];
  const litfsi = defaultSolutionBlockInput({
    name: "1 M LiTFSI in PC",
    solvent: "propylene-carbonate",
    components: [{ formula: "LiN(SO2CF3)2", amount: 1, unit: "mol/L" }],
  });
  await write(juno, "LiTFSI electrolytes", "1 M LiTFSI in propylene carbonate — batch 4", [
    paragraph("Dried salt 12 h at 120 °C under vacuum; mixed in the glovebox (H2O < 1 ppm)."),
    solution(litfsi),
    paragraph(
      "Far outside the Debye–Hückel range: the block says so. Conductivity measured separately.",
    ),
  ]);
}

const BY_SLUG: Record<string, (labId: string) => Promise<void>> = {
  "saltmarsh-interfaces": saltmarsh,
  "ridgeback-cells": ridgeback,
};

export async function demoContent(lab: { id: string; slug: string }): Promise<void> {
  await BY_SLUG[lab.slug]?.(lab.id);
}
