/**
 * Which forms Ionleaf weighs by default for each buffer (common laboratory practice, no
 * source): an acid form and a base form for "two-forms", and the single form used with a
 * strong acid or base stock for "titrate" (Tris base + HCl, Good's free acids + NaOH, …).
 * For phosphate the pair follows the step whose pKa is nearest the target pH.
 */
import type { BufferSystemId } from "./pka-goldberg-2002";

export const TWO_FORM_DEFAULTS: Record<BufferSystemId, readonly (readonly [string, string])[]> = {
  phosphate: [
    ["H3PO4", "NaH2PO4·H2O"],
    ["NaH2PO4·H2O", "Na2HPO4·7H2O"],
    ["Na2HPO4·7H2O", "Na3PO4·12H2O"],
  ],
  acetate: [["CH3COOH", "CH3COONa·3H2O"]],
  citrate: [["C6H8O7·H2O", "Na3C6H5O7·2H2O"]],
  carbonate: [["NaHCO3", "Na2CO3"]],
  borate: [["H3BO3", "Na2B4O7·10H2O"]],
  tris: [["C4H11NO3·HCl", "C4H11NO3"]],
  hepes: [["C8H18N2O4S", "C8H17N2NaO4S"]],
  mes: [["C6H13NO4S·H2O", "C6H12NNaO4S"]],
  mops: [["C7H15NO4S", "C7H14NNaO4S"]],
};

export const TITRATE_DEFAULTS: Record<BufferSystemId, string> = {
  phosphate: "NaH2PO4·H2O",
  acetate: "CH3COOH",
  citrate: "C6H8O7·H2O",
  carbonate: "NaHCO3",
  borate: "H3BO3",
  tris: "C4H11NO3",
  hepes: "C8H18N2O4S",
  mes: "C6H13NO4S·H2O",
  mops: "C7H15NO4S",
};
