/**
 * Reads "vs Ag/AgCl (3 M KCl)", "vs. SCE", "Reference: Ag/AgCl, sat. KCl" into lib/chem's
 * reference electrode id. Only an unambiguous match counts: "Ag/AgCl" alone could be
 * saturated, 3.5 M or 3 M KCl (12 mV apart), so it keeps its text and gets no id.
 */
import { listReferenceElectrodes, type ReferenceElectrodeId } from "@/lib/chem";
import type { ReferenceElectrodeText } from "./types";

/** Lower case without spaces, dots, brackets, commas and hyphens; "saturated" → "sat". */
function squash(text: string): string {
  return text
    .normalize("NFKC")
    .toLowerCase()
    .replace(/saturated/g, "sat")
    .replace(/mol\/l|mol l-1|mol dm-3/g, "m")
    .replace(/[\s.,()[\]{}_-]/g, "")
    .replace(/₂/g, "2");
}

const BY_SQUASHED = new Map<string, ReferenceElectrodeId>();
for (const electrode of listReferenceElectrodes()) {
  BY_SQUASHED.set(squash(electrode.id), electrode.id);
}
// Names the trade writes for the same electrodes.
const ALIASES: [string, ReferenceElectrodeId][] = [
  ["sce", "SCE"],
  ["satcalomel", "SCE"],
  ["saturatedcalomelelectrode", "SCE"],
  ["hg/hg2cl2satkcl", "SCE"],
  ["ag/agclsatkcl", "Ag/AgCl-satKCl"],
  ["ag/agclkclsat", "Ag/AgCl-satKCl"],
  ["ag/agcl35mkcl", "Ag/AgCl-3.5MKCl"],
  ["ag/agcl3mkcl", "Ag/AgCl-3MKCl"],
  ["she", "SHE"],
  ["rhe", "RHE"],
  ["hg/hgo1mnaoh", "Hg/HgO-1MNaOH"],
  ["hg/hg2so4satk2so4", "Hg/Hg2SO4-satK2SO4"],
  ["mse", "Hg/Hg2SO4-satK2SO4"],
];
for (const [text, id] of ALIASES) BY_SQUASHED.set(text, id);

export function readReferenceElectrode(text: string): ReferenceElectrodeText | null {
  const trimmed = text.trim().replace(/^vs\.?\s*/i, "");
  if (!trimmed) return null;
  return { text: trimmed, id: BY_SQUASHED.get(squash(trimmed)) ?? null };
}
