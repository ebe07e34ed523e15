import { defaultCellBlockInput, defaultSolutionBlockInput } from "./block-defaults";
import type { EntryDocument, EntryNode } from "./document-schema";

/**
 * Starting documents for a new entry. `build()` returns a fresh document each time, with new
 * block ids, so two entries made from one template never share an id.
 */
export interface EntryTemplate {
  id: string;
  title: string;
  description: string;
  build(): EntryDocument;
}

type Json = EntryNode;

const text = (value: string): Json => ({ type: "text", text: value });
const heading = (level: number, value: string): Json => ({
  type: "heading",
  attrs: { level },
  content: [text(value)],
});
const paragraph = (value?: string): Json => ({
  type: "paragraph",
  ...(value ? { content: [text(value)] } : {}),
});
const cell = (type: "tableHeader" | "tableCell", value: string): Json => ({
  type,
  content: [paragraph(value)],
});
const table = (header: string[], rows: string[][]): Json => ({
  type: "table",
  content: [
    { type: "tableRow", content: header.map((h) => cell("tableHeader", h)) },
    ...rows.map((row) => ({
      type: "tableRow" as const,
      content: row.map((v) => cell("tableCell", v)),
    })),
  ],
});
const checklist = (items: string[]): Json => ({
  type: "taskList",
  content: items.map((item) => ({
    type: "taskItem",
    attrs: { checked: false },
    content: [paragraph(item)],
  })),
});

function buildCellPreparation(): EntryDocument {
  const electrolyte = defaultSolutionBlockInput({
    name: "Supporting electrolyte A",
    temperatureC: 25,
    components: [
      { formula: "KCl", amount: 0.1, unit: "mol/L" },
      { formula: "K3Fe(CN)6", amount: 5, unit: "mmol/L" },
      { formula: "K4Fe(CN)6", amount: 5, unit: "mmol/L" },
    ],
  });
  const cell = defaultCellBlockInput({
    name: "Cell 1",
    workingElectrode: {
      material: "glassy carbon disc, 3 mm",
      areaCm2: 0.0707,
      pretreatment: [
        "Polish on 1.0 µm alumina slurry, 2 min, figure-eight strokes",
        "Polish on 0.05 µm alumina slurry, 2 min",
        "Sonicate in deionised water, 3 min",
        "Rinse with deionised water and dry under N2",
      ],
    },
    counterElectrode: {
      material: "platinum wire, coiled",
      areaCm2: 1.0,
      pretreatment: ["Flame-anneal and rinse"],
    },
    referenceElectrode: {
      type: "Ag/AgCl-3MKCl",
      material: "Ag/AgCl, 3 M KCl, ceramic frit",
      areaCm2: null,
      pretreatment: ["Check against a master reference electrode"],
    },
    electrolyteBlockId: electrolyte.blockId,
    purgeGas: "N2",
    purgeMinutes: 15,
    temperatureC: 25,
    couple: "Fe(CN)6 3-/4-",
  });
  return {
    type: "doc",
    content: [
      heading(1, "Cell preparation"),
      paragraph("Aim: what this cell is for, and what will be measured in it."),
      heading(2, "Electrolyte"),
      { type: "solutionBlock", attrs: electrolyte },
      heading(2, "Cell"),
      { type: "cellBlock", attrs: cell },
      heading(2, "Before the first scan"),
      checklist([
        "Electrodes polished and cleaned as listed in the cell block",
        "Reference electrode filling solution topped up, no bubbles at the frit",
        "Electrolyte purged with inert gas for the time listed",
        "Cables connected to the channel listed; open-circuit potential steady",
      ]),
      heading(2, "Scan plan"),
      table(
        ["Technique", "Potentials / V vs reference", "Rate or frequency", "Repeats"],
        [
          ["Cyclic voltammetry", "−0.2 to +0.6", "10, 25, 50, 100 mV/s", "3 cycles"],
          ["Impedance", "at E°′, 10 mV rms", "100 kHz to 0.1 Hz", "1"],
        ],
      ),
      heading(2, "Observations"),
      paragraph(),
    ],
  };
}

function buildElectrolyteStock(): EntryDocument {
  const stock = defaultSolutionBlockInput({
    name: "KNO3 stock, 0.5 M",
    temperatureC: 22,
    components: [{ formula: "KNO3", amount: 5.055, unit: "g", perAmount: 100, perUnit: "mL" }],
  });
  return {
    type: "doc",
    content: [
      heading(1, "Electrolyte stock"),
      paragraph("Reagent lot numbers, balance used, and the flask this stock went into."),
      heading(2, "Recipe"),
      { type: "solutionBlock", attrs: stock },
      heading(2, "Preparation"),
      checklist([
        "Salt dried and cooled in a desiccator before weighing",
        "Weighed into a clean beaker; mass recorded as read from the balance",
        "Dissolved in about half the final volume of deionised water",
        "Transferred quantitatively to the volumetric flask and made up to the mark at the recorded temperature",
        "Bottle labelled with name, concentration, date and initials",
      ]),
      heading(2, "Storage"),
      paragraph("Where it is kept and until when it is used."),
    ],
  };
}

export const entryTemplates: EntryTemplate[] = [
  {
    id: "cell-preparation",
    title: "Cell preparation",
    description:
      "Electrolyte, electrodes and their pretreatment, gas purge, and a checklist before the first scan.",
    build: buildCellPreparation,
  },
  {
    id: "electrolyte-stock",
    title: "Electrolyte stock",
    description: "A weighed stock solution with its recipe, preparation steps and storage.",
    build: buildElectrolyteStock,
  },
];

export function findTemplate(id: string): EntryTemplate | undefined {
  return entryTemplates.find((template) => template.id === id);
}
