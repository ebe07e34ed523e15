/** Finds a weighable buffer form or a strong electrolyte from what a chemist types. */
import { ChemInputError } from "../errors";
import { normalizeFormulaText } from "../formula/normalize";
import {
  BUFFER_REAGENTS,
  type BufferReagent,
  STRONG_ELECTROLYTES,
  type StrongElectrolyte,
} from "./data/buffer-reagents";

const ALIASES: Record<string, string> = {
  "tris-hcl": "C4H11NO3·HCl",
  "tris·hcl": "C4H11NO3·HCl",
  "tris hcl": "C4H11NO3·HCl",
  tris: "C4H11NO3",
  hepes: "C8H18N2O4S",
  mes: "C6H13NO4S·H2O",
  mops: "C7H15NO4S",
  borax: "Na2B4O7·10H2O",
};

const key = (text: string) => normalizeFormulaText(text).replace(/\s+/g, "");

export type ResolvedReagent =
  { kind: "buffer"; reagent: BufferReagent } | { kind: "strong"; reagent: StrongElectrolyte };

function findReagent(text: string): ResolvedReagent | undefined {
  const wanted = key(ALIASES[text.trim().toLowerCase()] ?? text);
  const buffer = BUFFER_REAGENTS.find(
    (r) => key(r.formula) === wanted || r.name.toLowerCase() === text.trim().toLowerCase(),
  );
  if (buffer) return { kind: "buffer", reagent: buffer };
  const strong = STRONG_ELECTROLYTES.find(
    (r) => key(r.formula) === wanted || r.name.toLowerCase() === text.trim().toLowerCase(),
  );
  if (strong) return { kind: "strong", reagent: strong };
  return undefined;
}

export function requireReagent(text: string, field: string): ResolvedReagent {
  const found = findReagent(text);
  if (!found) {
    throw new ChemInputError(
      `"${text}" is not a buffer reagent Ionleaf knows. Known forms include ${BUFFER_REAGENTS.slice(
        0,
        6,
      )
        .map((r) => r.formula)
        .join(", ")}, …, and the stocks HCl, NaOH, KOH and salts NaCl, KCl.`,
      { field, code: "unknown_species" },
    );
  }
  return found;
}
