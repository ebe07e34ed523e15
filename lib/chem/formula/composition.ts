import { ELEMENTS } from "../data/atomic-weights";
import { ChemInputError } from "../errors";

/** Element counts of one formula unit, e.g. { Cu: 1, S: 1, O: 9, H: 10 }. */
export type Composition = Record<string, number>;

const CLOSE_FOR: Record<string, string> = { "(": ")", "[": "]", "{": "}" };

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

  const readCount = (): number => {
    const m = /^\d+/.exec(core.slice(i));
    if (!m) return 1;
    i += m[0].length;
    const n = Number(m[0]);
    if (n === 0) fail(`A subscript of 0 in "${whole}" makes no sense.`);
    return n;
  };

  const parseGroup = (closer: string | null): Composition => {
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
        const inner = parseGroup(CLOSE_FOR[ch]);
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
      if (/[A-Z]/.test(ch)) {
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
      if (/[a-z]/.test(ch)) {
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

  Object.assign(counts, parseGroup(null));
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
