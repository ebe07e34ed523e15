/**
 * The linear core of recipe mode. At the target pH and the current ionic strength every
 * species fraction is fixed, so the buffer total and the charge balance are two linear
 * equations in the unknown amounts (two forms, or one form plus a titrant); I is recomputed
 * from the resulting composition (plus any salt topped up to a target I) and the solve is
 * repeated until I no longer changes.
 */
import { ChemInputError } from "../errors";
import type { Conditions } from "./conditions";
import type { BufferReagent, StrongElectrolyte } from "./data/buffer-reagents";
import type { AcidSystemData } from "./data/pka-goldberg-2002";
import { distribute, ionicStrengthOf, type IonAmount, waterIons } from "./equilibrium";
import type { RecipeComponent } from "./types";

export interface Unknown {
  formula: string;
  name: string;
  role: RecipeComponent["role"];
  /** Buffer units per formula unit (0 for titrant and salt). */
  units: number;
  /** Net charge of the counter-ions per formula unit. */
  counterCharge: number;
  ions: readonly { formula: string; charge: number; count: number }[];
  hazard?: string;
}

export function asUnknown(
  r: BufferReagent,
  system: AcidSystemData,
  role: RecipeComponent["role"],
): Unknown {
  const units = r.contributes
    .filter((c) => c.system === system.id)
    .reduce((a, c) => a + c.count, 0);
  return {
    formula: r.formula,
    name: r.name,
    role,
    units,
    counterCharge: r.counterIons.reduce((a, i) => a + i.charge * i.count, 0),
    ions: r.counterIons,
    hazard: r.hazard,
  };
}

export function strongUnknown(s: StrongElectrolyte, role: RecipeComponent["role"]): Unknown {
  const ions = s.ions.filter((i) => i.formula !== "H+" && i.formula !== "OH-");
  return {
    formula: s.formula,
    name: s.name,
    role,
    units: 0,
    counterCharge: ions.reduce((a, i) => a + i.charge * i.count, 0),
    ions,
    hazard: s.hazard,
  };
}

export interface Solved {
  amountsMolal: number[];
  saltMolal: number;
  ionicStrengthMolal: number;
}

/** Iterates the linear solve with I (see file comment). `fixed[k]` is a known molality or null. */
export function solveAmounts(
  system: AcidSystemData,
  unknowns: Unknown[],
  fixed: (number | null)[],
  totalMolal: number,
  pH: number,
  conditions: Conditions,
  salt: Unknown | null,
  targetIMolal: number | null,
): Solved {
  const pKa = conditions.pKaOf(system);
  let I = totalMolal;
  let saltMolal = 0;
  let x: number[] = [];
  for (let it = 0; it < 200; it++) {
    const g = conditions.gammaAt(I);
    const species = distribute({ data: system, pKa, totalMolal }, pH, g);
    const bufferCharge = species.reduce((a, m, k) => a + m * (system.charge0 - k), 0);
    const water = waterIons(pH, conditions.pKw, g);
    const rhs = -(bufferCharge + water[0].molality - water[1].molality);
    const free = unknowns.map((_, k) => fixed[k] === null);
    // Σ units·x = total;  Σ counterCharge·x = rhs
    let tRem = totalMolal;
    let qRem = rhs;
    unknowns.forEach((u, k) => {
      if (!free[k]) {
        tRem -= u.units * fixed[k]!;
        qRem -= u.counterCharge * fixed[k]!;
      }
    });
    const idx = free.flatMap((f, k) => (f ? [k] : []));
    x = unknowns.map((_, k) => fixed[k] ?? 0);
    if (idx.length === 2) {
      const [a, b] = idx;
      const det =
        unknowns[a].units * unknowns[b].counterCharge -
        unknowns[b].units * unknowns[a].counterCharge;
      if (Math.abs(det) < 1e-12)
        throw new ChemInputError(
          "These two forms differ in no counter-ion: choose an acid form and a base form.",
          { field: "reagents", code: "wrong_reagent" },
        );
      x[a] = (tRem * unknowns[b].counterCharge - unknowns[b].units * qRem) / det;
      x[b] = (unknowns[a].units * qRem - unknowns[a].counterCharge * tRem) / det;
    } else {
      const [a] = idx;
      x[a] = qRem / unknowns[a].counterCharge;
    }
    const ions: IonAmount[] = [...water];
    species.forEach((m, k) =>
      ions.push({ formula: system.species[k], charge: system.charge0 - k, molality: m }),
    );
    unknowns.forEach((u, k) =>
      u.ions.forEach((ion) =>
        ions.push({
          formula: ion.formula,
          charge: ion.charge,
          molality: Math.max(x[k], 0) * ion.count,
        }),
      ),
    );
    let nextI = ionicStrengthOf(ions);
    if (salt && targetIMolal !== null) {
      saltMolal = Math.max(0, saltMolal + (targetIMolal - (nextI + saltMolal)));
      nextI += saltMolal;
    }
    if (Math.abs(nextI - I) <= 1e-13 * Math.max(1, I))
      return { amountsMolal: x, saltMolal, ionicStrengthMolal: nextI };
    I = nextI;
  }
  throw new ChemInputError(
    "The recipe did not converge (the ionic strength did not settle in 200 iterations); try a lower concentration.",
    { field: "totalConcentrationMolar", code: "model_failed" },
  );
}
