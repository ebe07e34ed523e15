import type { DilutionInput, StockRef, VolumeUnit } from "./block-schemas";

/*
 * A solution made from stocks: "10 mL of stock A made up to 100 mL, plus 0.75 g KCl". Pure and
 * shared: the editor computes the child's composition from the stock compositions the server
 * sends it, and the server computes it, on save, from the same stored results read in its own
 * transaction. Both call `dilutionComponents`, so both show the same numbers.
 *
 * Moles are conserved when a volume V₁ of a stock of molar concentration c₁ is made up to a
 * final volume V₂: c₂ = c₁·V₁/V₂ (common practice). The result is a molar concentration of each
 * of the stock's components in the child; lib/chem turns it into molality with the child's
 * density (its density model where it has coefficients, otherwise the solvent's density,
 * which the block then says).
 */

/** The composition of a stock as its stored result recorded it, in mol/L of each component. */
export interface StockComposition {
  entryId: string;
  blockId: string;
  revision: number;
  name: string;
  entryTitle: string;
  solvent: string;
  temperatureC: number;
  components: { formula: string; molarity: number }[];
}

/** What is known of one stock reference: its composition, still loading, or why not. */
export type StockLookup =
  | { status: "ok"; stock: StockComposition }
  | { status: "loading" }
  | { status: "unavailable"; message: string };

export type StockLookups = ReadonlyMap<string, StockLookup>;

/** One line of the arithmetic, for the block: c₁ → c₂ of each component of each stock. */
interface DilutionLine {
  stockIndex: number;
  formula: string;
  stockMolarity: number;
  volumeMl: number;
  finalVolumeMl: number;
  molarity: number;
}

export type DilutionOutcome =
  | { status: "none" }
  | { status: "loading" }
  | { status: "error"; field: string; message: string }
  | {
      status: "ok";
      /** Components for lib/chem, one per formula (stocks of the same salt add up). */
      components: { formula: string; amount: number; unit: "mol/L" }[];
      lines: DilutionLine[];
      finalVolumeMl: number;
      notes: string[];
    };

const ML_PER_UNIT: Record<VolumeUnit, number> = { µL: 1e-3, mL: 1, L: 1000 };

export const toMl = (value: number, unit: VolumeUnit) => value * ML_PER_UNIT[unit];

/** The key a stock reference is looked up by: entry, block and revision. */
export const stockKey = (ref: Pick<StockRef, "entryId" | "blockId" | "revision">) =>
  `${ref.entryId}/${ref.blockId}@${ref.revision}`;

/** True when a block is made from at least one stock. */
export function hasStocks(dilution: DilutionInput | null | undefined): dilution is DilutionInput {
  return !!dilution && dilution.stocks.length > 0;
}

/**
 * The stock's composition from its stored result (the `results` JSON of solution_results):
 * each component's molar concentration, as computed when the stock's revision was saved.
 * Null when the stock's block had no result (empty or refused by the engine).
 */
export function stockComponentsFromResult(
  results: Record<string, unknown>,
): { formula: string; molarity: number }[] | null {
  if (results.status !== "ok" || !Array.isArray(results.components)) return null;
  const out: { formula: string; molarity: number }[] = [];
  for (const c of results.components as unknown[]) {
    const { formula, molarity } = (c ?? {}) as { formula?: unknown; molarity?: unknown };
    if (typeof formula !== "string" || typeof molarity !== "number") return null;
    if (!Number.isFinite(molarity) || molarity < 0) return null;
    out.push({ formula, molarity });
  }
  return out.length > 0 ? out : null;
}

const fmt = (x: number) => Number(x.toPrecision(4)).toString();

/** The child's components contributed by its stocks, with the arithmetic shown. */
export function dilutionComponents(
  dilution: DilutionInput | null | undefined,
  lookups: StockLookups,
  childSolvent = "water",
): DilutionOutcome {
  if (!hasStocks(dilution)) return { status: "none" };
  if (dilution.finalVolume === null)
    return { status: "error", field: "dilution.finalVolume", message: "Enter the final volume." };
  const finalVolumeMl = toMl(dilution.finalVolume, dilution.finalVolumeUnit);
  if (!(finalVolumeMl > 0))
    return {
      status: "error",
      field: "dilution.finalVolume",
      message: "The final volume must be greater than zero.",
    };
  let takenMl = 0;
  const lines: DilutionLine[] = [];
  const totals = new Map<string, number>();
  const notes: string[] = [];
  let loading = false;
  for (const [i, ref] of dilution.stocks.entries()) {
    const field = `dilution.stocks[${i}]`;
    if (ref.volume === null)
      return { status: "error", field: `${field}.volume`, message: "Enter the volume taken." };
    const volumeMl = toMl(ref.volume, ref.volumeUnit);
    if (!(volumeMl > 0))
      return {
        status: "error",
        field: `${field}.volume`,
        message: "The volume taken must be greater than zero.",
      };
    takenMl += volumeMl;
    const lookup = lookups.get(stockKey(ref));
    if (!lookup || lookup.status === "loading") {
      loading = true;
      continue;
    }
    if (lookup.status === "unavailable") return { status: "error", field, message: lookup.message };
    const { stock } = lookup;
    for (const c of stock.components) {
      const molarity = (c.molarity * volumeMl) / finalVolumeMl;
      lines.push({
        stockIndex: i,
        formula: c.formula,
        stockMolarity: c.molarity,
        volumeMl,
        finalVolumeMl,
        molarity,
      });
      totals.set(c.formula, (totals.get(c.formula) ?? 0) + molarity);
    }
    if (stock.solvent !== childSolvent)
      notes.push(
        `Stock "${stock.name || "unnamed"}" was made in ${stock.solvent}; this solution is made up in ${childSolvent}. The dilution treats them as one solvent.`,
      );
  }
  if (takenMl > finalVolumeMl * (1 + 1e-9))
    return {
      status: "error",
      field: "dilution.finalVolume",
      message: `The stocks taken add up to ${fmt(takenMl)} mL, more than the final volume of ${fmt(finalVolumeMl)} mL.`,
    };
  if (loading) return { status: "loading" };
  notes.unshift(
    "Dilution: c₂ = c₁·V₁/V₂ for each component of each stock (moles conserved, volumes as measured; stock concentrations as stored with the stock's revision).",
  );
  return {
    status: "ok",
    components: [...totals].map(([formula, amount]) => ({ formula, amount, unit: "mol/L" })),
    lines,
    finalVolumeMl,
    notes,
  };
}

interface JsonNode {
  type?: unknown;
  attrs?: Record<string, unknown>;
  content?: unknown;
}

/**
 * A copy of the document in which one solution block uses a stock at another revision: the
 * only change "use the newer revision of this stock" makes. Returns how many references moved
 * (0 when the block does not use that stock).
 */
export function moveStockRevision(
  doc: unknown,
  target: { blockId: string; parentEntryId: string; parentBlockId: string; toRevision: number },
): { content: unknown; moved: number } {
  const content = structuredClone(doc);
  let moved = 0;
  const stack: unknown[] = [content];
  while (stack.length > 0) {
    const node = stack.pop() as JsonNode | null | undefined;
    if (!node || typeof node !== "object") continue;
    if (node.type === "solutionBlock" && node.attrs?.blockId === target.blockId) {
      const dilution = node.attrs.dilution as DilutionInput | null | undefined;
      for (const ref of dilution?.stocks ?? []) {
        if (
          ref.entryId === target.parentEntryId &&
          ref.blockId === target.parentBlockId &&
          ref.revision !== target.toRevision
        ) {
          ref.revision = target.toRevision;
          moved += 1;
        }
      }
    }
    if (Array.isArray(node.content)) stack.push(...(node.content as unknown[]));
  }
  return { content, moved };
}

/**
 * The stock compositions a stored result was computed with, read back from its arithmetic
 * (`results.dilution.lines`), so a saved revision shows its own numbers without asking anyone.
 */
export function stockLookupsFromStored(
  dilution: DilutionInput | null | undefined,
  results: Record<string, unknown>,
): Map<string, StockLookup> {
  const lookups = new Map<string, StockLookup>();
  if (!hasStocks(dilution)) return lookups;
  const stored = results.dilution as { lines?: DilutionLine[] } | undefined;
  const lines = Array.isArray(stored?.lines) ? stored.lines : [];
  for (const [i, ref] of dilution.stocks.entries()) {
    const components = lines
      .filter((l) => l.stockIndex === i)
      .map((l) => ({ formula: l.formula, molarity: l.stockMolarity }));
    if (components.length === 0) continue;
    lookups.set(stockKey(ref), {
      status: "ok",
      stock: { ...ref, name: "", entryTitle: "", solvent: "", temperatureC: 25, components },
    });
  }
  return lookups;
}
