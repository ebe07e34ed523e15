import { ELEMENTS } from "../data/atomic-weights";
import { ChemInputError } from "../errors";

/** Element counts of one formula unit, e.g. { Cu: 1, S: 1, O: 9, H: 10 }. */
export type Composition = Record<string, number>;

const CLOSE_FOR: Record<string, string> = { "(": ")", "[": "]", "{": "}" };

/** Deepest bracket nesting accepted ("K3[Fe(CN)6]" has 2); deeper is a typing error, not chemistry. */
const MAX_FORMULA_NESTING = 8;
/** Largest subscript accepted (4 digits: polymers are entered by their repeat unit). */
const MAX_SUBSCRIPT = 9999;

function fail(message: string): never {
  throw new ChemInputError(message, { field: "formula", code: "bad_formula" });
}

/**
 * Counts the elements of a neutral formula core: element symbols with integer subscripts,
 * nested (), [] and {} groups with multipliers. `whole` is the text shown in messages.
 */
export function parseComposition(core: string, whole: string): Composition {
  const counts: Composition = {};
  let i = 0;

  // One left-to-right pass: every character is read once (linear in the length).
  const readCount = (): number => {
    let n = 0;
    let digits = 0;
    while (i < core.length && core[i] >= "0" && core[i] <= "9") {
      n = n * 10 + (core.charCodeAt(i) - 48);
      i++;
      if (++digits > 4) fail(`A subscript in "${whole}" is larger than ${MAX_SUBSCRIPT}.`);
    }
    if (digits === 0) return 1;
    if (n === 0) fail(`A subscript of 0 in "${whole}" makes no sense.`);
    return n;
  };

  const parseGroup = (closer: string | null, depth: number): Composition => {
    if (depth > MAX_FORMULA_NESTING)
      fail(`"${whole.slice(0, 40)}…" nests brackets more than ${MAX_FORMULA_NESTING} deep.`);
    const group: Composition = {};
    let sawSomething = false;
    while (i < core.length) {
      const ch = core[i];
      if (ch === " ") {
        i++;
        continue;
      }
      if (CLOSE_FOR[ch]) {
        i++;
        const inner = parseGroup(CLOSE_FOR[ch], depth + 1);
        const n = readCount();
        for (const [el, c] of Object.entries(inner)) group[el] = (group[el] ?? 0) + c * n;
        sawSomething = true;
        continue;
      }
      if (ch === ")" || ch === "]" || ch === "}") {
        if (ch !== closer) fail(`Unbalanced "${ch}" in "${whole}".`);
        if (!sawSomething) fail(`Empty brackets in "${whole}".`);
        i++;
        return group;
      }
      if (ch >= "A" && ch <= "Z") {
        const two = core.slice(i, i + 2);
        const symbol = /^[A-Z][a-z]$/.test(two) && ELEMENTS.has(two) ? two : ch;
        if (!ELEMENTS.has(symbol)) {
          const shown = /^[A-Z][a-z]$/.test(two) ? two : ch;
          fail(`"${shown}" in "${whole}" is not an element symbol.`);
        }
        i += symbol.length;
        const n = readCount();
        group[symbol] = (group[symbol] ?? 0) + n;
        sawSomething = true;
        continue;
      }
      if (ch >= "a" && ch <= "z") {
        fail(
          `"${ch}" in "${whole}" is not an element symbol (symbols start with a capital letter).`,
        );
      }
      fail(`Unexpected "${ch}" in "${whole}".`);
    }
    if (closer) fail(`A bracket is not closed in "${whole}".`);
    if (!sawSomething) fail(`"${whole}" contains no element.`);
    return group;
  };

  Object.assign(counts, parseGroup(null, 0));
  return counts;
}

export function addComposition(target: Composition, source: Composition, times = 1): Composition {
  for (const [el, c] of Object.entries(source)) target[el] = (target[el] ?? 0) + c * times;
  return target;
}

/** Hill-order key ("C H then alphabetical") plus charge: the same ion written two ways matches. */
export function compositionKey(composition: Composition, charge: number): string {
  const symbols = Object.keys(composition).filter((s) => composition[s] !== 0);
  const hasCarbon = symbols.includes("C");
  symbols.sort((a, b) => {
    if (hasCarbon) {
      const rank = (s: string) => (s === "C" ? 0 : s === "H" ? 1 : 2);
      if (rank(a) !== rank(b)) return rank(a) - rank(b);
    }
    return a < b ? -1 : a > b ? 1 : 0;
  });
  return (
    symbols.map((s) => s + (composition[s] === 1 ? "" : composition[s])).join("") + "|" + charge
  );
}
