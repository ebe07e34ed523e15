/**
 * Filling solutions of the reference electrodes in reference-electrodes.ts, as ions, for the
 * junction potential. Saturated KCl at 25 °C is taken as 4.2 mol/L and saturated K₂SO₄ as
 * 0.69 mol/L (solubilities from the CRC Handbook "Aqueous Solubility of Inorganic
 * Compounds", recalled). SHE and RHE have no fixed filling (they sit in the cell's own
 * solution or a bridge): null.
 */
import type { IonConcentration } from "./electrolyte-conductivity";
import type { ReferenceElectrodeId } from "./reference-electrodes";

const kcl = (c: number): IonConcentration[] => [
  { formula: "K+", concentrationMolPerL: c },
  { formula: "Cl-", concentrationMolPerL: c },
];

const FILLINGS: Record<ReferenceElectrodeId, { ions: IonConcentration[]; label: string } | null> = {
  SHE: null,
  RHE: null,
  SCE: { ions: kcl(4.2), label: "saturated KCl (≈ 4.2 mol/L)" },
  "Ag/AgCl-satKCl": { ions: kcl(4.2), label: "saturated KCl (≈ 4.2 mol/L)" },
  "Ag/AgCl-3.5MKCl": { ions: kcl(3.5), label: "3.5 mol/L KCl" },
  "Ag/AgCl-3MKCl": { ions: kcl(3), label: "3 mol/L KCl" },
  "Hg/HgO-1MNaOH": {
    ions: [
      { formula: "Na+", concentrationMolPerL: 1 },
      { formula: "OH-", concentrationMolPerL: 1 },
    ],
    label: "1 mol/L NaOH",
  },
  "Hg/Hg2SO4-satK2SO4": {
    ions: [
      { formula: "K+", concentrationMolPerL: 1.38 },
      { formula: "SO4^2-", concentrationMolPerL: 0.69 },
    ],
    label: "saturated K₂SO₄ (≈ 0.69 mol/L)",
  },
};

export function referenceFillingSolution(
  id: ReferenceElectrodeId,
): { ions: IonConcentration[]; label: string } | null {
  const filling = FILLINGS[id];
  return filling ? { ions: filling.ions.map((i) => ({ ...i })), label: filling.label } : null;
}
