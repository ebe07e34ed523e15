/**
 * Decides what each column is: the mapping dialog's answer first, then the column names.
 * The first column that holds a quantity gets its role (a name beats a unit alone); the
 * others are listed as problems so nobody wonders which potential was plotted.
 */
import {
  DEFAULT_UNIT,
  DIMENSION_OF_QUANTITY,
  normaliseColumnName,
  readColumnName,
} from "./column-names";
import { TraceParseError } from "./errors";
import type { ColumnMapping, Quantity, TraceColumn } from "./types";
import { readUnit, SI_UNIT_OF_DIMENSION, type UnitReading } from "./units";
import { QUANTITIES } from "./types";

type ColumnPlan = Omit<TraceColumn, "minSi" | "maxSi" | "numericCells" | "nonNumericCells">;

export interface RolePlan {
  columns: ColumnPlan[];
  roles: Partial<Record<Quantity, number>>;
  problems: string[];
  mappingApplied: boolean;
}

function mappedUnit(quantity: Quantity, unitText: string): UnitReading | null {
  if (quantity === "cycle") return null;
  const unit = readUnit(unitText);
  const wanted = DIMENSION_OF_QUANTITY[quantity];
  if (
    !unit ||
    (unit.dimension !== wanted && !(quantity === "current" && unit.dimension === "currentDensity"))
  )
    throw new TraceParseError(
      `The mapping gives ${quantity} the unit "${unitText}", which does not fit it.`,
      "bad_mapping",
    );
  return unit;
}

function findColumn(names: string[], column: string | number): number {
  if (typeof column === "number")
    return Number.isInteger(column) && column >= 0 && column < names.length ? column : -1;
  const exact = names.indexOf(column);
  if (exact !== -1) return exact;
  const wanted = normaliseColumnName(column);
  return names.findIndex((n) => normaliseColumnName(n) === wanted);
}

export function planColumns(names: string[], mapping: ColumnMapping | undefined): RolePlan {
  const problems: string[] = [];
  const roles: Partial<Record<Quantity, number>> = {};
  const readings = names.map(readColumnName);
  const plans: (ColumnPlan & { unitReading: UnitReading | null; sign: 1 | -1 })[] = names.map(
    (name, index) => {
      const r = readings[index];
      return {
        index,
        name,
        quantity: r.quantity,
        recognisedBy: r.recognisedBy,
        unit: r.unit?.canonical ?? null,
        siUnit: null,
        siFactor: 1,
        referenceElectrode: r.referenceElectrode,
        unitReading: r.unit,
        sign: r.sign,
      };
    },
  );

  let mappingApplied = false;
  for (const quantity of QUANTITIES) {
    const entry = mapping?.[quantity];
    if (!entry) continue;
    const index = findColumn(names, entry.column);
    if (index === -1) {
      problems.push(
        `The saved mapping names column "${entry.column}" for ${quantity}, but the file has no such column.`,
      );
      continue;
    }
    mappingApplied = true;
    const plan = plans[index];
    const sameQuantity = plan.quantity === quantity;
    plan.quantity = quantity;
    plan.recognisedBy = "mapping";
    plan.sign = sameQuantity ? plan.sign : 1;
    if (entry.unit !== undefined) plan.unitReading = mappedUnit(quantity, entry.unit);
    else if (!sameQuantity) plan.unitReading = null;
    plan.unit = plan.unitReading?.canonical ?? null;
    roles[quantity] = index;
  }

  // Mapped columns first, then names, then units alone; ties by column order.
  const rank = { mapping: 0, name: 1, unit: 2 } as const;
  const byRank = plans
    .filter((p) => p.quantity !== null && p.recognisedBy !== "mapping")
    .sort((a, b) => rank[a.recognisedBy!] - rank[b.recognisedBy!] || a.index - b.index);
  for (const plan of byRank) {
    const q = plan.quantity!;
    const holder = roles[q];
    if (holder === undefined) {
      roles[q] = plan.index;
      continue;
    }
    const first = plans[holder];
    const units =
      first.unit !== plan.unit
        ? ` (in ${first.unit ?? "no unit"} and ${plan.unit ?? "no unit"})`
        : "";
    problems.push(
      `Two columns hold ${q}: "${first.name}" and "${plan.name}"${units}; "${first.name}" is used.`,
    );
  }

  names.forEach((name, index) => {
    const r = readings[index];
    if (plans[index].recognisedBy === "mapping" || !r.problem || name.trim() === "") return;
    problems.push(r.problem);
  });

  for (const plan of plans) {
    if (plan.quantity === null || plan.quantity === "cycle") continue;
    if (!plan.unitReading) {
      const fallback = DEFAULT_UNIT[plan.quantity]!;
      plan.unitReading = readUnit(fallback);
      plan.unit = plan.unitReading!.canonical;
      problems.push(`Column "${plan.name}" states no unit; it is read as ${plan.unit}.`);
    }
    plan.siUnit = SI_UNIT_OF_DIMENSION[plan.unitReading!.dimension];
    plan.siFactor = plan.unitReading!.siFactor * plan.sign;
  }
  const columns = plans.map(({ unitReading: _u, sign: _s, ...rest }) => rest);
  return { columns, roles, problems, mappingApplied };
}
