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

/** Every reagent by formula key and by lower-case name, built once (buffer reagents win). */
const BY_KEY = new Map<string, ResolvedReagent>();
for (const reagent of STRONG_ELECTROLYTES) {
  BY_KEY.set(key(reagent.formula), { kind: "strong", reagent });
  BY_KEY.set(`name:${reagent.name.toLowerCase()}`, { kind: "strong", reagent });
}
for (const reagent of BUFFER_REAGENTS) {
  BY_KEY.set(key(reagent.formula), { kind: "buffer", reagent });
  BY_KEY.set(`name:${reagent.name.toLowerCase()}`, { kind: "buffer", reagent });
}

function findReagent(text: string): ResolvedReagent | undefined {
  if (typeof text !== "string" || text.length > 200) return undefined;
  const lower = text.trim().toLowerCase();
  const byName = BY_KEY.get(`name:${lower}`);
  const byFormula = BY_KEY.get(key(ALIASES[lower] ?? text));
  // A formula match wins over a name match, buffer reagents over strong electrolytes (as before).
  if (byFormula?.kind === "buffer") return byFormula;
  if (byName?.kind === "buffer") return byName;
  return byFormula ?? byName;
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
