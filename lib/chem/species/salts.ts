/**
 * Built-in catalogue of salts, acids and bases used in electrochemistry, with how each
 * dissociates ("2 Na+ + SO4^2-"; ions in their canonical spelling, see species/ions.ts).
 * Complete dissociation is assumed for strong electrolytes; `note` says where the trade
 * knows that is an approximation. Weak acids and bases (`weak`) enter as undissociated
 * molecules until speciation is computed (lib/chem/acid-base, part 2).
 * Hydrates are recognised by formula (CuSO4·5H2O → CuSO4); `hydrates` lists common ones
 * for the type-ahead.
 */
export type SpeciesKind = "salt" | "acid" | "base" | "ion" | "molecule";

export interface SaltData {
  formula: string;
  name: string;
  dissociation: string;
  aliases?: string[];
  hydrates?: number[];
  note?: string;
  weak?: boolean;
}

const HSO4_NOTE = "Second dissociation of sulfuric acid (pKa2 ≈ 1.99) is treated as complete.";
const HYDROLYSIS = "Hydrolysis of the anion is not included: the solution is not neutral.";
const WEAK = "Weak electrolyte: entered undissociated; its speciation is not computed here.";

const S = (
  formula: string,
  name: string,
  dissociation: string,
  more: Partial<SaltData> = {},
): SaltData => ({
  formula,
  name,
  dissociation,
  ...more,
});

export const SALTS: readonly SaltData[] = [
  // alkali and alkaline-earth halides
  S("LiCl", "lithium chloride", "Li+ + Cl-", { hydrates: [1] }),
  S("LiBr", "lithium bromide", "Li+ + Br-"),
  S("LiI", "lithium iodide", "Li+ + I-"),
  S("NaF", "sodium fluoride", "Na+ + F-"),
  S("NaCl", "sodium chloride", "Na+ + Cl-"),
  S("NaBr", "sodium bromide", "Na+ + Br-"),
  S("NaI", "sodium iodide", "Na+ + I-"),
  S("KF", "potassium fluoride", "K+ + F-"),
  S("KCl", "potassium chloride", "K+ + Cl-"),
  S("KBr", "potassium bromide", "K+ + Br-"),
  S("KI", "potassium iodide", "K+ + I-"),
  S("RbCl", "rubidium chloride", "Rb+ + Cl-"),
  S("CsCl", "caesium chloride", "Cs+ + Cl-"),
  S("NH4Cl", "ammonium chloride", "NH4+ + Cl-"),
  S("MgCl2", "magnesium chloride", "Mg^2+ + 2 Cl-", { hydrates: [6] }),
  S("MgBr2", "magnesium bromide", "Mg^2+ + 2 Br-", { hydrates: [6] }),
  S("CaCl2", "calcium chloride", "Ca^2+ + 2 Cl-", { hydrates: [2, 6] }),
  S("CaBr2", "calcium bromide", "Ca^2+ + 2 Br-"),
  S("SrCl2", "strontium chloride", "Sr^2+ + 2 Cl-", { hydrates: [6] }),
  S("BaCl2", "barium chloride", "Ba^2+ + 2 Cl-", { hydrates: [2] }),
  // nitrates
  S("LiNO3", "lithium nitrate", "Li+ + NO3-"),
  S("NaNO3", "sodium nitrate", "Na+ + NO3-"),
  S("KNO3", "potassium nitrate", "K+ + NO3-"),
  S("NH4NO3", "ammonium nitrate", "NH4+ + NO3-"),
  S("AgNO3", "silver nitrate", "Ag+ + NO3-"),
  S("Mg(NO3)2", "magnesium nitrate", "Mg^2+ + 2 NO3-", { hydrates: [6] }),
  S("Ca(NO3)2", "calcium nitrate", "Ca^2+ + 2 NO3-", { hydrates: [4] }),
  S("Ba(NO3)2", "barium nitrate", "Ba^2+ + 2 NO3-"),
  S("Cu(NO3)2", "copper(II) nitrate", "Cu^2+ + 2 NO3-", { hydrates: [3] }),
  S("Zn(NO3)2", "zinc nitrate", "Zn^2+ + 2 NO3-", { hydrates: [6] }),
  S("Ni(NO3)2", "nickel(II) nitrate", "Ni^2+ + 2 NO3-", { hydrates: [6] }),
  S("Co(NO3)2", "cobalt(II) nitrate", "Co^2+ + 2 NO3-", { hydrates: [6] }),
  S("Pb(NO3)2", "lead(II) nitrate", "Pb^2+ + 2 NO3-"),
  S("Cd(NO3)2", "cadmium nitrate", "Cd^2+ + 2 NO3-", { hydrates: [4] }),
  S("Fe(NO3)3", "iron(III) nitrate", "Fe^3+ + 3 NO3-", {
    hydrates: [9],
    note: "Fe3+ hydrolyses strongly unless acidified.",
  }),
  S("Al(NO3)3", "aluminium nitrate", "Al^3+ + 3 NO3-", { hydrates: [9] }),
  S("La(NO3)3", "lanthanum nitrate", "La^3+ + 3 NO3-", { hydrates: [6] }),
  // perchlorates
  S("LiClO4", "lithium perchlorate", "Li+ + ClO4-"),
  S("NaClO4", "sodium perchlorate", "Na+ + ClO4-", { hydrates: [1] }),
  S("KClO4", "potassium perchlorate", "K+ + ClO4-", {
    note: "Sparingly soluble (about 15 g/L at 25 °C).",
  }),
  S("Mg(ClO4)2", "magnesium perchlorate", "Mg^2+ + 2 ClO4-"),
  S("N(C4H9)4ClO4", "tetrabutylammonium perchlorate", "N(C4H9)4^+ + ClO4-", {
    aliases: ["TBAP", "TBAClO4", "Bu4NClO4", "NBu4ClO4"],
  }),
  S("N(C2H5)4ClO4", "tetraethylammonium perchlorate", "N(C2H5)4^+ + ClO4-", {
    aliases: ["TEAP", "TEAClO4", "Et4NClO4"],
  }),
  // sulfates
  S("Li2SO4", "lithium sulfate", "2 Li+ + SO4^2-", { hydrates: [1] }),
  S("Na2SO4", "sodium sulfate", "2 Na+ + SO4^2-", { hydrates: [10] }),
  S("K2SO4", "potassium sulfate", "2 K+ + SO4^2-"),
  S("(NH4)2SO4", "ammonium sulfate", "2 NH4+ + SO4^2-"),
  S("MgSO4", "magnesium sulfate", "Mg^2+ + SO4^2-", {
    hydrates: [7],
    note: "Mg²⁺ and SO4²⁻ pair (MgSO4°): free-ion models are used with ion association; Pitzer's parameters describe the pairing.",
  }),
  S("CuSO4", "copper(II) sulfate", "Cu^2+ + SO4^2-", { hydrates: [5] }),
  S("ZnSO4", "zinc sulfate", "Zn^2+ + SO4^2-", { hydrates: [7] }),
  S("NiSO4", "nickel(II) sulfate", "Ni^2+ + SO4^2-", { hydrates: [6] }),
  S("CoSO4", "cobalt(II) sulfate", "Co^2+ + SO4^2-", { hydrates: [7] }),
  S("MnSO4", "manganese(II) sulfate", "Mn^2+ + SO4^2-", { hydrates: [1] }),
  S("FeSO4", "iron(II) sulfate", "Fe^2+ + SO4^2-", { hydrates: [7] }),
  S("CdSO4", "cadmium sulfate", "Cd^2+ + SO4^2-"),
  S("Fe2(SO4)3", "iron(III) sulfate", "2 Fe^3+ + 3 SO4^2-"),
  S("Al2(SO4)3", "aluminium sulfate", "2 Al^3+ + 3 SO4^2-", { hydrates: [18] }),
  S("(NH4)2Fe(SO4)2", "ammonium iron(II) sulfate (Mohr's salt)", "2 NH4+ + Fe^2+ + 2 SO4^2-", {
    hydrates: [6],
  }),
  S("NaHSO4", "sodium hydrogen sulfate", "Na+ + HSO4-"),
  S("KHSO4", "potassium hydrogen sulfate", "K+ + HSO4-"),
  S("Ce(SO4)2", "cerium(IV) sulfate", "Ce^4+ + 2 SO4^2-", { hydrates: [4] }),
  // hydroxides (strong bases)
  S("LiOH", "lithium hydroxide", "Li+ + OH-", { hydrates: [1] }),
  S("NaOH", "sodium hydroxide", "Na+ + OH-"),
  S("KOH", "potassium hydroxide", "K+ + OH-"),
  S("CsOH", "caesium hydroxide", "Cs+ + OH-"),
  S("Ba(OH)2", "barium hydroxide", "Ba^2+ + 2 OH-", { hydrates: [8] }),
  S("Ca(OH)2", "calcium hydroxide", "Ca^2+ + 2 OH-", {
    note: "Sparingly soluble (about 1.7 g/L at 25 °C).",
  }),
  S("N(C4H9)4OH", "tetrabutylammonium hydroxide", "N(C4H9)4^+ + OH-", { aliases: ["TBAOH"] }),
  // phosphates
  S("NaH2PO4", "sodium dihydrogen phosphate", "Na+ + H2PO4-", { hydrates: [1, 2] }),
  S("Na2HPO4", "disodium hydrogen phosphate", "2 Na+ + HPO4^2-", { hydrates: [2, 7, 12] }),
  S("Na3PO4", "trisodium phosphate", "3 Na+ + PO4^3-", { hydrates: [12], note: HYDROLYSIS }),
  S("KH2PO4", "potassium dihydrogen phosphate", "K+ + H2PO4-"),
  S("K2HPO4", "dipotassium hydrogen phosphate", "2 K+ + HPO4^2-", { hydrates: [3] }),
  S("K3PO4", "tripotassium phosphate", "3 K+ + PO4^3-", { note: HYDROLYSIS }),
  S("NH4H2PO4", "ammonium dihydrogen phosphate", "NH4+ + H2PO4-"),
  // carbonates
  S("Li2CO3", "lithium carbonate", "2 Li+ + CO3^2-", { note: HYDROLYSIS }),
  S("Na2CO3", "sodium carbonate", "2 Na+ + CO3^2-", { hydrates: [1, 10], note: HYDROLYSIS }),
  S("K2CO3", "potassium carbonate", "2 K+ + CO3^2-", { note: HYDROLYSIS }),
  S("Cs2CO3", "caesium carbonate", "2 Cs+ + CO3^2-", { note: HYDROLYSIS }),
  S("NaHCO3", "sodium hydrogen carbonate", "Na+ + HCO3-"),
  S("KHCO3", "potassium hydrogen carbonate", "K+ + HCO3-"),
  // acetates, formates, oxalates
  S("CH3COONa", "sodium acetate", "Na+ + CH3COO-", {
    aliases: ["NaOAc", "NaAc", "NaC2H3O2"],
    hydrates: [3],
  }),
  S("CH3COOK", "potassium acetate", "K+ + CH3COO-", { aliases: ["KOAc", "KAc"] }),
  S("CH3COOLi", "lithium acetate", "Li+ + CH3COO-", { aliases: ["LiOAc"], hydrates: [2] }),
  S("CH3COONH4", "ammonium acetate", "NH4+ + CH3COO-", { aliases: ["NH4OAc"] }),
  S("HCOONa", "sodium formate", "Na+ + HCOO-"),
  S("Na2C2O4", "sodium oxalate", "2 Na+ + C2O4^2-"),
  // hexacyanoferrates and other redox probes
  S("K3Fe(CN)6", "potassium hexacyanoferrate(III)", "3 K+ + Fe(CN)6^3-", {
    aliases: ["potassium ferricyanide", "K3[Fe(CN)6]"],
  }),
  S("K4Fe(CN)6", "potassium hexacyanoferrate(II)", "4 K+ + Fe(CN)6^4-", {
    aliases: ["potassium ferrocyanide", "K4[Fe(CN)6]"],
    hydrates: [3],
  }),
  S("Na4Fe(CN)6", "sodium hexacyanoferrate(II)", "4 Na+ + Fe(CN)6^4-", { hydrates: [10] }),
  S("Ru(NH3)6Cl3", "hexaammineruthenium(III) chloride", "Ru(NH3)6^3+ + 3 Cl-", {
    aliases: ["[Ru(NH3)6]Cl3", "RuHex"],
  }),
  S("Ru(NH3)6Cl2", "hexaammineruthenium(II) chloride", "Ru(NH3)6^2+ + 2 Cl-", {
    aliases: ["[Ru(NH3)6]Cl2"],
  }),
  S("Co(NH3)6Cl3", "hexaamminecobalt(III) chloride", "Co(NH3)6^3+ + 3 Cl-", {
    aliases: ["[Co(NH3)6]Cl3"],
  }),
  S("KMnO4", "potassium permanganate", "K+ + MnO4-"),
  S("K2CrO4", "potassium chromate", "2 K+ + CrO4^2-"),
  S("K2Cr2O7", "potassium dichromate", "2 K+ + Cr2O7^2-"),
  S("KSCN", "potassium thiocyanate", "K+ + SCN-"),
  S("Na2S2O3", "sodium thiosulfate", "2 Na+ + S2O3^2-", { hydrates: [5] }),
  S("KIO3", "potassium iodate", "K+ + IO3-"),
  S("NaNO2", "sodium nitrite", "Na+ + NO2-"),
  S("Na2MoO4", "sodium molybdate", "2 Na+ + MoO4^2-", { hydrates: [2] }),
  S("(NH4)2Ce(NO3)6", "ammonium cerium(IV) nitrate", "2 NH4+ + Ce^4+ + 6 NO3-", {
    aliases: ["CAN"],
    note: "Ce(IV) is largely complexed by nitrate; free-ion activities are approximate.",
  }),
  S("KCN", "potassium cyanide", "K+ + CN-", { note: HYDROLYSIS }),
  // supporting electrolytes for non-aqueous work
  S("N(C4H9)4PF6", "tetrabutylammonium hexafluorophosphate", "N(C4H9)4^+ + PF6-", {
    aliases: ["TBAPF6", "Bu4NPF6", "NBu4PF6"],
  }),
  S("N(C4H9)4BF4", "tetrabutylammonium tetrafluoroborate", "N(C4H9)4^+ + BF4-", {
    aliases: ["TBABF4", "Bu4NBF4", "NBu4BF4"],
  }),
  S("N(C4H9)4Br", "tetrabutylammonium bromide", "N(C4H9)4^+ + Br-", { aliases: ["TBABr", "TBAB"] }),
  S("N(C4H9)4Cl", "tetrabutylammonium chloride", "N(C4H9)4^+ + Cl-", { aliases: ["TBACl"] }),
  S(
    "N(C4H9)4N(SO2CF3)2",
    "tetrabutylammonium bis(trifluoromethanesulfonyl)imide",
    "N(C4H9)4^+ + N(SO2CF3)2^-",
    { aliases: ["TBATFSI", "TBA-TFSI"] },
  ),
  S("N(C2H5)4BF4", "tetraethylammonium tetrafluoroborate", "N(C2H5)4^+ + BF4-", {
    aliases: ["TEABF4", "Et4NBF4"],
  }),
  S("N(C2H5)4PF6", "tetraethylammonium hexafluorophosphate", "N(C2H5)4^+ + PF6-", {
    aliases: ["TEAPF6", "Et4NPF6"],
  }),
  S("N(C2H5)4Cl", "tetraethylammonium chloride", "N(C2H5)4^+ + Cl-", { aliases: ["TEACl"] }),
  S("N(CH3)4Cl", "tetramethylammonium chloride", "N(CH3)4^+ + Cl-", { aliases: ["TMACl"] }),
  S("N(C3H7)4Br", "tetrapropylammonium bromide", "N(C3H7)4^+ + Br-", { aliases: ["TPABr"] }),
  S("LiPF6", "lithium hexafluorophosphate", "Li+ + PF6-"),
  S("LiBF4", "lithium tetrafluoroborate", "Li+ + BF4-"),
  S("LiN(SO2CF3)2", "lithium bis(trifluoromethanesulfonyl)imide", "Li+ + N(SO2CF3)2^-", {
    aliases: ["LiTFSI", "LiNTf2", "LiTFSA"],
  }),
  S("LiCF3SO3", "lithium trifluoromethanesulfonate", "Li+ + CF3SO3-", {
    aliases: ["LiOTf", "lithium triflate"],
  }),
  S("LiAsF6", "lithium hexafluoroarsenate", "Li+ + AsF6-"),
  S("NaPF6", "sodium hexafluorophosphate", "Na+ + PF6-"),
  S("KPF6", "potassium hexafluorophosphate", "K+ + PF6-"),
  S("NaN(SO2CF3)2", "sodium bis(trifluoromethanesulfonyl)imide", "Na+ + N(SO2CF3)2^-", {
    aliases: ["NaTFSI"],
  }),
  S("NaBF4", "sodium tetrafluoroborate", "Na+ + BF4-"),
  // transition-metal and other chlorides
  S("FeCl2", "iron(II) chloride", "Fe^2+ + 2 Cl-", { hydrates: [4] }),
  S("FeCl3", "iron(III) chloride", "Fe^3+ + 3 Cl-", {
    hydrates: [6],
    note: "Fe3+ hydrolyses and forms chloro complexes; free-ion activities are approximate.",
  }),
  S("CuCl2", "copper(II) chloride", "Cu^2+ + 2 Cl-", { hydrates: [2] }),
  S("NiCl2", "nickel(II) chloride", "Ni^2+ + 2 Cl-", { hydrates: [6] }),
  S("CoCl2", "cobalt(II) chloride", "Co^2+ + 2 Cl-", { hydrates: [6] }),
  S("ZnCl2", "zinc chloride", "Zn^2+ + 2 Cl-", {
    note: "Zinc forms chloro complexes above about 0.1 mol/kg.",
  }),
  S("MnCl2", "manganese(II) chloride", "Mn^2+ + 2 Cl-", { hydrates: [4] }),
  S("CdCl2", "cadmium chloride", "Cd^2+ + 2 Cl-", {
    note: "CdCl+ ion pairs form at low concentration.",
  }),
  S("CrCl3", "chromium(III) chloride", "Cr^3+ + 3 Cl-", { hydrates: [6] }),
  S("AlCl3", "aluminium chloride", "Al^3+ + 3 Cl-", { hydrates: [6] }),
  S("LaCl3", "lanthanum chloride", "La^3+ + 3 Cl-", { hydrates: [7] }),
  S("SnCl2", "tin(II) chloride", "Sn^2+ + 2 Cl-", { hydrates: [2] }),
  // strong acids
  S("HCl", "hydrochloric acid", "H+ + Cl-"),
  S("HBr", "hydrobromic acid", "H+ + Br-"),
  S("HI", "hydroiodic acid", "H+ + I-"),
  S("HNO3", "nitric acid", "H+ + NO3-"),
  S("HClO4", "perchloric acid", "H+ + ClO4-"),
  S("H2SO4", "sulfuric acid", "2 H+ + SO4^2-", { note: HSO4_NOTE }),
  S("CF3SO3H", "trifluoromethanesulfonic acid", "H+ + CF3SO3-", {
    aliases: ["triflic acid", "HOTf"],
  }),
  S("HBF4", "tetrafluoroboric acid", "H+ + BF4-"),
  // weak acids and bases (undissociated here)
  S("CH3COOH", "acetic acid", "", { weak: true, note: WEAK, aliases: ["AcOH", "HOAc"] }),
  S("H3PO4", "phosphoric acid", "", { weak: true, note: WEAK }),
  S("HF", "hydrofluoric acid", "", { weak: true, note: WEAK }),
  S("H3BO3", "boric acid", "", { weak: true, note: WEAK }),
  S("HCOOH", "formic acid", "", { weak: true, note: WEAK }),
  S("H2C2O4", "oxalic acid", "", { weak: true, note: WEAK, hydrates: [2] }),
  S("NH3", "ammonia", "", { weak: true, note: WEAK }),
];

/** Hazards that belong to a whole compound rather than to one of its ions. */
export const COMPOUND_HAZARDS: Readonly<Record<string, string>> = {
  HF: "Hydrofluoric acid: penetrates skin and causes deep burns and systemic fluoride poisoning; calcium gluconate gel at hand.",
  HClO4:
    "Perchloric acid: hot or concentrated perchloric acid reacts explosively with organics; use a perchloric-acid fume hood.",
  KCN: "Potassium cyanide is acutely toxic; acid releases HCN gas.",
  H2C2O4: "Oxalic acid is toxic if swallowed.",
};
