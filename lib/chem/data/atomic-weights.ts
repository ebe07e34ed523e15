/**
 * Standard atomic weights, IUPAC 2021 abridged values (CIAAW; Prohaska et al. 2022,
 * Pure Appl. Chem. 94, 573–600), for all 118 elements.
 *
 * - Elements with an interval standard atomic weight use the abridged (conventional) value
 *   (H 1.0080, Li 6.94, C 12.011, …).
 * - Elements with no stable isotope and no characteristic terrestrial composition have no
 *   standard atomic weight; by common practice the mass number of the longest-lived isotope
 *   is used (marked `radioactive: true`). Th, Pa and U do have standard atomic weights.
 * - Values for H, Li, C, N, O, F, Na, Mg, Al, P, S, Cl, K, Ca, Cr, Mn, Fe, Co, Ni, Cu, Zn, Br,
 *   Ag, Cd, I, Cs, Ba, La, Hg, Pb were checked against tests/fixtures/reference/constants.csv;
 *   the others are the abridged table as recalled (from memory).
 */
export interface ElementData {
  symbol: string;
  atomicNumber: number;
  name: string;
  atomicWeight: number;
  radioactive?: true;
}

// [symbol, name, atomic weight, radioactive (longest-lived isotope mass number)]
const ROWS: [string, string, number, 0 | 1][] = [
  ["H", "hydrogen", 1.008, 0],
  ["He", "helium", 4.0026, 0],
  ["Li", "lithium", 6.94, 0],
  ["Be", "beryllium", 9.0122, 0],
  ["B", "boron", 10.81, 0],
  ["C", "carbon", 12.011, 0],
  ["N", "nitrogen", 14.007, 0],
  ["O", "oxygen", 15.999, 0],
  ["F", "fluorine", 18.998, 0],
  ["Ne", "neon", 20.18, 0],
  ["Na", "sodium", 22.99, 0],
  ["Mg", "magnesium", 24.305, 0],
  ["Al", "aluminium", 26.982, 0],
  ["Si", "silicon", 28.085, 0],
  ["P", "phosphorus", 30.974, 0],
  ["S", "sulfur", 32.06, 0],
  ["Cl", "chlorine", 35.45, 0],
  ["Ar", "argon", 39.95, 0],
  ["K", "potassium", 39.098, 0],
  ["Ca", "calcium", 40.078, 0],
  ["Sc", "scandium", 44.956, 0],
  ["Ti", "titanium", 47.867, 0],
  ["V", "vanadium", 50.942, 0],
  ["Cr", "chromium", 51.996, 0],
  ["Mn", "manganese", 54.938, 0],
  ["Fe", "iron", 55.845, 0],
  ["Co", "cobalt", 58.933, 0],
  ["Ni", "nickel", 58.693, 0],
  ["Cu", "copper", 63.546, 0],
  ["Zn", "zinc", 65.38, 0],
  ["Ga", "gallium", 69.723, 0],
  ["Ge", "germanium", 72.63, 0],
  ["As", "arsenic", 74.922, 0],
  ["Se", "selenium", 78.971, 0],
  ["Br", "bromine", 79.904, 0],
  ["Kr", "krypton", 83.798, 0],
  ["Rb", "rubidium", 85.468, 0],
  ["Sr", "strontium", 87.62, 0],
  ["Y", "yttrium", 88.906, 0],
  ["Zr", "zirconium", 91.222, 0],
  ["Nb", "niobium", 92.906, 0],
  ["Mo", "molybdenum", 95.95, 0],
  ["Tc", "technetium", 97, 1],
  ["Ru", "ruthenium", 101.07, 0],
  ["Rh", "rhodium", 102.91, 0],
  ["Pd", "palladium", 106.42, 0],
  ["Ag", "silver", 107.87, 0],
  ["Cd", "cadmium", 112.41, 0],
  ["In", "indium", 114.82, 0],
  ["Sn", "tin", 118.71, 0],
  ["Sb", "antimony", 121.76, 0],
  ["Te", "tellurium", 127.6, 0],
  ["I", "iodine", 126.9, 0],
  ["Xe", "xenon", 131.29, 0],
  ["Cs", "caesium", 132.91, 0],
  ["Ba", "barium", 137.33, 0],
  ["La", "lanthanum", 138.91, 0],
  ["Ce", "cerium", 140.12, 0],
  ["Pr", "praseodymium", 140.91, 0],
  ["Nd", "neodymium", 144.24, 0],
  ["Pm", "promethium", 145, 1],
  ["Sm", "samarium", 150.36, 0],
  ["Eu", "europium", 151.96, 0],
  ["Gd", "gadolinium", 157.25, 0],
  ["Tb", "terbium", 158.93, 0],
  ["Dy", "dysprosium", 162.5, 0],
  ["Ho", "holmium", 164.93, 0],
  ["Er", "erbium", 167.26, 0],
  ["Tm", "thulium", 168.93, 0],
  ["Yb", "ytterbium", 173.05, 0],
  ["Lu", "lutetium", 174.97, 0],
  ["Hf", "hafnium", 178.49, 0],
  ["Ta", "tantalum", 180.95, 0],
  ["W", "tungsten", 183.84, 0],
  ["Re", "rhenium", 186.21, 0],
  ["Os", "osmium", 190.23, 0],
  ["Ir", "iridium", 192.22, 0],
  ["Pt", "platinum", 195.08, 0],
  ["Au", "gold", 196.97, 0],
  ["Hg", "mercury", 200.59, 0],
  ["Tl", "thallium", 204.38, 0],
  ["Pb", "lead", 207.2, 0],
  ["Bi", "bismuth", 208.98, 0],
  ["Po", "polonium", 209, 1],
  ["At", "astatine", 210, 1],
  ["Rn", "radon", 222, 1],
  ["Fr", "francium", 223, 1],
  ["Ra", "radium", 226, 1],
  ["Ac", "actinium", 227, 1],
  ["Th", "thorium", 232.04, 0],
  ["Pa", "protactinium", 231.04, 0],
  ["U", "uranium", 238.03, 0],
  ["Np", "neptunium", 237, 1],
  ["Pu", "plutonium", 244, 1],
  ["Am", "americium", 243, 1],
  ["Cm", "curium", 247, 1],
  ["Bk", "berkelium", 247, 1],
  ["Cf", "californium", 251, 1],
  ["Es", "einsteinium", 252, 1],
  ["Fm", "fermium", 257, 1],
  ["Md", "mendelevium", 258, 1],
  ["No", "nobelium", 259, 1],
  ["Lr", "lawrencium", 262, 1],
  ["Rf", "rutherfordium", 267, 1],
  ["Db", "dubnium", 268, 1],
  ["Sg", "seaborgium", 269, 1],
  ["Bh", "bohrium", 270, 1],
  ["Hs", "hassium", 269, 1],
  ["Mt", "meitnerium", 278, 1],
  ["Ds", "darmstadtium", 281, 1],
  ["Rg", "roentgenium", 282, 1],
  ["Cn", "copernicium", 285, 1],
  ["Nh", "nihonium", 286, 1],
  ["Fl", "flerovium", 289, 1],
  ["Mc", "moscovium", 290, 1],
  ["Lv", "livermorium", 293, 1],
  ["Ts", "tennessine", 294, 1],
  ["Og", "oganesson", 294, 1],
];

export const ELEMENTS: ReadonlyMap<string, ElementData> = new Map(
  ROWS.map(([symbol, name, atomicWeight, radioactive], index) => [
    symbol,
    radioactive
      ? { symbol, name, atomicWeight, atomicNumber: index + 1, radioactive: true as const }
      : { symbol, name, atomicWeight, atomicNumber: index + 1 },
  ]),
);

export function atomicWeight(symbol: string): number | undefined {
  return ELEMENTS.get(symbol)?.atomicWeight;
}
