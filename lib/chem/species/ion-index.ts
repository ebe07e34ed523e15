/** Lookup of catalogue ions by composition key and by alias (built once, at import). */
import { parseFormulaWith } from "../formula/parse";
import { IONS, type IonData } from "./ions";

export interface IndexedIon extends IonData {
  charge: number;
  key: string;
}

const BY_KEY = new Map<string, IndexedIon>();
const BY_ALIAS = new Map<string, IndexedIon>();

for (const ion of IONS) {
  const parsed = parseFormulaWith(ion.formula);
  const indexed: IndexedIon = { ...ion, charge: parsed.charge, key: parsed.key };
  BY_KEY.set(parsed.key, indexed);
  BY_ALIAS.set(ion.name.toLowerCase(), indexed);
  for (const alias of ion.aliases ?? []) BY_ALIAS.set(alias.toLowerCase(), indexed);
}

export function isKnownIonKey(key: string): boolean {
  return BY_KEY.has(key);
}

export function ionByKey(key: string): IndexedIon | undefined {
  return BY_KEY.get(key);
}

export function ionByAlias(text: string): IndexedIon | undefined {
  return BY_ALIAS.get(text.trim().toLowerCase());
}

export function allIons(): IndexedIon[] {
  return [...BY_KEY.values()];
}
