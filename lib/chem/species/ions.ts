/**
 * Ions the engine knows by name. Formulas use the unambiguous canonical spelling
 * ("Fe^3+", "SO4^2-"); ion-size and b parameters live in data/ion-size-*.ts.
 * `hazards` are notes a lab should see when the ion is in a solution (common practice).
 */
export interface IonData {
  formula: string;
  name: string;
  aliases?: string[];
  hazards?: string[];
}

const HG = "Mercury compounds are highly toxic; collect mercury waste separately.";
const CD = "Cadmium compounds are toxic and carcinogenic.";
const PB = "Lead compounds are toxic (reproductive toxicant).";
const CR6 = "Chromium(VI) is carcinogenic and a strong oxidiser.";
const CN = "Free cyanide: never acidify (releases HCN gas).";

export const IONS: readonly IonData[] = [
  // cations
  { formula: "H+", name: "hydrogen ion", aliases: ["proton"] },
  { formula: "Li+", name: "lithium" },
  { formula: "Na+", name: "sodium" },
  { formula: "K+", name: "potassium" },
  { formula: "Rb+", name: "rubidium" },
  { formula: "Cs+", name: "caesium" },
  { formula: "NH4+", name: "ammonium" },
  { formula: "Ag+", name: "silver(I)" },
  { formula: "Tl+", name: "thallium(I)", hazards: ["Thallium salts are highly toxic."] },
  { formula: "Cu+", name: "copper(I)" },
  { formula: "Mg^2+", name: "magnesium" },
  { formula: "Ca^2+", name: "calcium" },
  { formula: "Sr^2+", name: "strontium" },
  { formula: "Ba^2+", name: "barium", hazards: ["Soluble barium salts are toxic."] },
  {
    formula: "Be^2+",
    name: "beryllium",
    hazards: ["Beryllium compounds are highly toxic and carcinogenic."],
  },
  { formula: "Mn^2+", name: "manganese(II)" },
  { formula: "Fe^2+", name: "iron(II)" },
  {
    formula: "Co^2+",
    name: "cobalt(II)",
    hazards: ["Cobalt(II) salts are carcinogenic (category 1B) and sensitising."],
  },
  {
    formula: "Ni^2+",
    name: "nickel(II)",
    hazards: ["Nickel(II) salts are carcinogenic and skin sensitisers."],
  },
  { formula: "Cu^2+", name: "copper(II)" },
  { formula: "Zn^2+", name: "zinc" },
  { formula: "Cd^2+", name: "cadmium", hazards: [CD] },
  { formula: "Pb^2+", name: "lead(II)", hazards: [PB] },
  { formula: "Hg^2+", name: "mercury(II)", hazards: [HG] },
  { formula: "Hg2^2+", name: "mercury(I)", hazards: [HG] },
  { formula: "Sn^2+", name: "tin(II)" },
  { formula: "Fe^3+", name: "iron(III)" },
  { formula: "Al^3+", name: "aluminium" },
  { formula: "Cr^3+", name: "chromium(III)" },
  { formula: "La^3+", name: "lanthanum" },
  { formula: "Ce^3+", name: "cerium(III)" },
  { formula: "In^3+", name: "indium(III)" },
  { formula: "Ce^4+", name: "cerium(IV)" },
  { formula: "Ru(NH3)6^3+", name: "hexaammineruthenium(III)", aliases: ["[Ru(NH3)6]3+", "RuHex"] },
  { formula: "Ru(NH3)6^2+", name: "hexaammineruthenium(II)", aliases: ["[Ru(NH3)6]2+"] },
  { formula: "Co(NH3)6^3+", name: "hexaamminecobalt(III)", aliases: ["[Co(NH3)6]3+"] },
  { formula: "N(CH3)4^+", name: "tetramethylammonium", aliases: ["TMA+", "Me4N+", "NMe4+"] },
  { formula: "N(C2H5)4^+", name: "tetraethylammonium", aliases: ["TEA+", "Et4N+", "NEt4+"] },
  { formula: "N(C3H7)4^+", name: "tetrapropylammonium", aliases: ["TPA+", "Pr4N+", "NPr4+"] },
  { formula: "N(C4H9)4^+", name: "tetrabutylammonium", aliases: ["TBA+", "Bu4N+", "NBu4+"] },
  // anions
  { formula: "OH-", name: "hydroxide" },
  {
    formula: "F-",
    name: "fluoride",
    hazards: [
      "Fluoride with acid forms HF: corrosive, penetrates skin, calcium gluconate gel at hand.",
    ],
  },
  { formula: "Cl-", name: "chloride" },
  { formula: "Br-", name: "bromide" },
  { formula: "I-", name: "iodide" },
  { formula: "NO3-", name: "nitrate" },
  { formula: "NO2-", name: "nitrite" },
  {
    formula: "ClO4-",
    name: "perchlorate",
    hazards: [
      "Perchlorate: strong oxidiser; dry perchlorate residues with organic matter can explode — never evaporate to dryness.",
    ],
  },
  {
    formula: "ClO3-",
    name: "chlorate",
    hazards: ["Chlorate: strong oxidiser; keep away from organics and acids."],
  },
  { formula: "BrO3-", name: "bromate" },
  { formula: "IO3-", name: "iodate" },
  { formula: "IO4-", name: "periodate" },
  { formula: "MnO4-", name: "permanganate", hazards: ["Permanganate: strong oxidiser."] },
  { formula: "SCN-", name: "thiocyanate" },
  { formula: "CN-", name: "cyanide", hazards: [CN] },
  { formula: "HCO3-", name: "hydrogen carbonate", aliases: ["bicarbonate"] },
  { formula: "CO3^2-", name: "carbonate" },
  { formula: "SO4^2-", name: "sulfate" },
  { formula: "HSO4-", name: "hydrogen sulfate", aliases: ["bisulfate"] },
  { formula: "SO3^2-", name: "sulfite" },
  { formula: "S2O3^2-", name: "thiosulfate" },
  { formula: "S^2-", name: "sulfide", hazards: ["Sulfide with acid releases toxic H2S."] },
  {
    formula: "HS-",
    name: "hydrogen sulfide ion",
    hazards: ["Hydrosulfide with acid releases toxic H2S."],
  },
  { formula: "H2PO4-", name: "dihydrogen phosphate" },
  { formula: "HPO4^2-", name: "hydrogen phosphate" },
  { formula: "PO4^3-", name: "phosphate" },
  { formula: "CH3COO-", name: "acetate", aliases: ["OAc-", "AcO-", "C2H3O2-"] },
  { formula: "HCOO-", name: "formate" },
  { formula: "C2O4^2-", name: "oxalate" },
  { formula: "CrO4^2-", name: "chromate", hazards: [CR6] },
  { formula: "Cr2O7^2-", name: "dichromate", hazards: [CR6] },
  { formula: "MoO4^2-", name: "molybdate" },
  { formula: "WO4^2-", name: "tungstate" },
  {
    formula: "Fe(CN)6^3-",
    name: "hexacyanoferrate(III)",
    aliases: ["ferricyanide", "[Fe(CN)6]3-"],
  },
  { formula: "Fe(CN)6^4-", name: "hexacyanoferrate(II)", aliases: ["ferrocyanide", "[Fe(CN)6]4-"] },
  {
    formula: "PF6-",
    name: "hexafluorophosphate",
    hazards: ["Hexafluorophosphate hydrolyses (moisture, acid, heat) to HF."],
  },
  {
    formula: "BF4-",
    name: "tetrafluoroborate",
    hazards: ["Tetrafluoroborate hydrolyses slowly in water and acid to HF."],
  },
  {
    formula: "N(SO2CF3)2^-",
    name: "bis(trifluoromethanesulfonyl)imide",
    aliases: ["TFSI-", "NTf2-", "TFSA-"],
  },
  { formula: "CF3SO3-", name: "trifluoromethanesulfonate", aliases: ["OTf-", "triflate"] },
  {
    formula: "AsF6-",
    name: "hexafluoroarsenate",
    hazards: ["Arsenic compound: toxic; hydrolyses to HF."],
  },
];
