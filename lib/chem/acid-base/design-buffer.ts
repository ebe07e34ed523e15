/**
 * Recipe mode: the amounts to weigh (or stock to add) for V mL of buffer B at total
 * concentration c, pH p and temperature T, optionally topped up with NaCl/KCl to a target
 * ionic strength. At the target pH and the current I every species fraction is known, so the
 * charge balance and the buffer total are two linear equations in the two unknown amounts;
 * I is then recomputed and the solve repeated until it is self-consistent. The recipe is
 * finally re-speciated forward (speciate.ts) and that pH is the one reported.
 */
import { ChemInputError } from "../errors";
import { molarMass } from "../formula";
import { cautionsFor } from "./cautions";
import { conditionsAt } from "./conditions";
import type { BufferReagent, StrongElectrolyte } from "./data/buffer-reagents";
import { TITRATE_DEFAULTS, TWO_FORM_DEFAULTS } from "./data/default-forms";
import { ACID_SYSTEMS, acidSystem, type AcidSystemData } from "./data/pka-goldberg-2002";
import { asUnknown, type Solved, solveAmounts, strongUnknown, type Unknown } from "./recipe-solve";
import { requireReagent } from "./reagent-lookup";
import { equilibrate, solventKgPerLitre } from "./speciate";
import type { DesignBufferInput, DesignBufferResult, RecipeComponent } from "./types";

/** Largest gap between the requested pH and the recipe's own computed pH. */
const RECIPE_PH_TOLERANCE = 0.02;

function bufferReagent(formula: string, system: AcidSystemData, field: string): BufferReagent {
  const found = requireReagent(formula, field);
  if (found.kind !== "buffer" || !found.reagent.contributes.some((c) => c.system === system.id)) {
    throw new ChemInputError(`${formula} is not a form of the ${system.name} buffer.`, {
      field,
      code: "wrong_reagent",
    });
  }
  return found.reagent;
}

function checkInput(input: DesignBufferInput): AcidSystemData {
  const system = acidSystem(input.buffer);
  if (!system) {
    throw new ChemInputError(
      `Unknown buffer "${input.buffer}". Ionleaf designs: ${ACID_SYSTEMS.map((s) => s.id).join(", ")}.`,
      {
        field: "buffer",
        code: "unknown_buffer",
      },
    );
  }
  if (!(Number.isFinite(input.pH) && input.pH >= 0 && input.pH <= 14)) {
    throw new ChemInputError("Target pH must be between 0 and 14.", {
      field: "pH",
      code: "out_of_range",
    });
  }
  if (!(
    Number.isFinite(input.totalConcentrationMolar) &&
    input.totalConcentrationMolar > 0 &&
    input.totalConcentrationMolar <= 2
  )) {
    throw new ChemInputError("Buffer concentration must be above 0 and at most 2 mol/L.", {
      field: "totalConcentrationMolar",
      code: "out_of_range",
    });
  }
  if (!(Number.isFinite(input.volumeMl) && input.volumeMl > 0)) {
    throw new ChemInputError("Final volume must be a positive number of millilitres.", {
      field: "volumeMl",
      code: "invalid_amount",
    });
  }
  if (
    input.targetIonicStrengthMolar !== undefined &&
    !(Number.isFinite(input.targetIonicStrengthMolar) && input.targetIonicStrengthMolar >= 0)
  ) {
    throw new ChemInputError("Target ionic strength must be a non-negative number (mol/L).", {
      field: "targetIonicStrengthMolar",
      code: "invalid_amount",
    });
  }
  if (
    input.titrant &&
    !(Number.isFinite(input.titrant.concentrationMolar) && input.titrant.concentrationMolar > 0)
  ) {
    throw new ChemInputError("Stock concentration must be a positive number (mol/L).", {
      field: "titrant.concentrationMolar",
      code: "invalid_amount",
    });
  }
  return system;
}

function nearestStep(pKa: number[], pH: number): number {
  let best = 0;
  pKa.forEach((p, i) => {
    if (Math.abs(p - pH) < Math.abs(pKa[best] - pH)) best = i;
  });
  return best;
}

export function designBuffer(input: DesignBufferInput): DesignBufferResult {
  const system = checkInput(input);
  const conditions = conditionsAt(input.temperatureC, input.activityConvention);
  const kgPerL = solventKgPerLitre(conditions);
  const litres = input.volumeMl / 1000;
  const kgWater = litres * kgPerL;
  const totalMolal = input.totalConcentrationMolar / kgPerL;
  const pKa = conditions.pKaOf(system);
  const step = nearestStep(pKa, input.pH);
  const method = input.method ?? "two-forms";
  const salt =
    input.targetIonicStrengthMolar !== undefined
      ? strongUnknown(
          requireReagent(input.salt ?? "NaCl", "salt").reagent as StrongElectrolyte,
          "salt",
        )
      : null;
  const targetIMolal =
    input.targetIonicStrengthMolar !== undefined ? input.targetIonicStrengthMolar / kgPerL : null;

  let unknowns: Unknown[];
  let solved: Solved;
  if (method === "two-forms") {
    const pair =
      input.reagents ??
      TWO_FORM_DEFAULTS[system.id][Math.min(step, TWO_FORM_DEFAULTS[system.id].length - 1)];
    if (pair.length !== 2)
      throw new ChemInputError("Give exactly two forms: an acid form and a base form.", {
        field: "reagents",
        code: "wrong_reagent",
      });
    unknowns = pair.map((f, i) =>
      asUnknown(
        bufferReagent(f, system, `reagents[${i}]`),
        system,
        i === 0 ? "acid form" : "base form",
      ),
    );
    solved = solveAmounts(
      system,
      unknowns,
      [null, null],
      totalMolal,
      input.pH,
      conditions,
      salt,
      targetIMolal,
    );
    const bad = solved.amountsMolal.findIndex((v) => v < -1e-12);
    if (bad >= 0) {
      throw new ChemInputError(
        `pH ${input.pH} cannot be reached with ${unknowns[0].formula} and ${unknowns[1].formula} alone (it would need a negative amount of ${unknowns[bad].formula}); choose other forms or method "titrate".`,
        { field: "pH", code: "unreachable_ph" },
      );
    }
  } else {
    const formFormula = input.reagents?.[0] ?? TITRATE_DEFAULTS[system.id];
    const form = asUnknown(
      bufferReagent(formFormula, system, "reagents[0]"),
      system,
      "buffer form",
    );
    const stock = (f: string) =>
      strongUnknown(requireReagent(f, "titrant.formula").reagent as StrongElectrolyte, "titrant");
    const fixedForm = totalMolal / form.units;
    const first = input.titrant?.formula ?? "NaOH";
    unknowns = [form, stock(first)];
    solved = solveAmounts(
      system,
      unknowns,
      [fixedForm, null],
      totalMolal,
      input.pH,
      conditions,
      salt,
      targetIMolal,
    );
    if (solved.amountsMolal[1] < -1e-12) {
      if (input.titrant) {
        throw new ChemInputError(
          `pH ${input.pH} needs ${first === "HCl" ? "a base" : "an acid"}, not ${first}.`,
          { field: "titrant.formula", code: "unreachable_ph" },
        );
      }
      unknowns = [form, stock("HCl")];
      solved = solveAmounts(
        system,
        unknowns,
        [fixedForm, null],
        totalMolal,
        input.pH,
        conditions,
        salt,
        targetIMolal,
      );
    }
  }

  const stockMolar = input.titrant?.concentrationMolar ?? 1;
  const components: RecipeComponent[] = unknowns.map((u, k) => {
    const amountMol = Math.max(solved.amountsMolal[k], 0) * kgWater;
    if (u.role === "titrant")
      return {
        formula: u.formula,
        name: `${u.name}, ${stockMolar} mol/L stock`,
        role: u.role,
        amountMol,
        volumeMl: (amountMol / stockMolar) * 1000,
      };
    const M = molarMass(u.formula);
    return {
      formula: u.formula,
      name: u.name,
      role: u.role,
      amountMol,
      massG: amountMol * M,
      molarMassGPerMol: M,
    };
  });
  if (salt && solved.saltMolal > 0) {
    const amountMol = solved.saltMolal * kgWater;
    const M = molarMass(salt.formula);
    components.push({
      formula: salt.formula,
      name: salt.name,
      role: "salt",
      amountMol,
      massG: amountMol * M,
      molarMassGPerMol: M,
    });
  }
  const titrant = components.find((c) => c.role === "titrant");
  if (titrant && titrant.volumeMl! > input.volumeMl) {
    throw new ChemInputError(
      `The ${stockMolar} mol/L stock would need ${titrant.volumeMl!.toFixed(1)} mL, more than the final volume: use a stronger stock.`,
      {
        field: "titrant.concentrationMolar",
        code: "stock_too_dilute",
      },
    );
  }

  // Forward check: speciate exactly what the recipe puts in.
  const fixedIons = new Map<string, { charge: number; molality: number }>();
  unknowns.forEach((u, k) =>
    u.ions.forEach((i) => {
      const prev = fixedIons.get(i.formula)?.molality ?? 0;
      fixedIons.set(i.formula, {
        charge: i.charge,
        molality: prev + Math.max(solved.amountsMolal[k], 0) * i.count,
      });
    }),
  );
  if (salt)
    salt.ions.forEach((i) => {
      const prev = fixedIons.get(i.formula)?.molality ?? 0;
      fixedIons.set(i.formula, { charge: i.charge, molality: prev + solved.saltMolal * i.count });
    });
  const check = equilibrate(
    new Map([[system.id, totalMolal]]),
    [...fixedIons].map(([formula, v]) => ({ formula, ...v })),
    conditions,
    kgPerL,
  );

  if (
    !Number.isFinite(check.pH) ||
    components.some(
      (c) =>
        !Number.isFinite(c.amountMol) ||
        (c.massG ?? 0) < 0 ||
        !Number.isFinite(c.massG ?? 0) ||
        !Number.isFinite(c.volumeMl ?? 0),
    )
  ) {
    throw new ChemInputError("No finite recipe exists for this buffer, pH and concentration.", {
      field: "pH",
      code: "model_failed",
    });
  }
  // The recipe's own computed pH must be the one asked for: otherwise it is not a recipe.
  if (Math.abs(check.pH - input.pH) > RECIPE_PH_TOLERANCE) {
    throw new ChemInputError(
      `The recipe would give pH ${check.pH.toFixed(3)}, not ${input.pH}: this buffer cannot be made at this pH and concentration with these forms.`,
      { field: "pH", code: "unreachable_ph" },
    );
  }
  const warnings = [...check.warnings];
  if (Math.abs(input.pH - pKa[step]) > 1) {
    warnings.push(
      `pH ${input.pH} is more than 1 unit from the nearest pKa of ${system.name} (${pKa[step].toFixed(2)} at ${conditions.temperatureC} °C): buffer capacity is low.`,
    );
  }
  if (
    targetIMolal !== null &&
    solved.saltMolal === 0 &&
    check.ionicStrength.molar > input.targetIonicStrengthMolar! + 1e-9
  ) {
    warnings.push(
      `The buffer alone gives I = ${check.ionicStrength.molar.toFixed(4)} mol/L, above the target ${input.targetIonicStrengthMolar} mol/L; no salt added.`,
    );
  }
  const weighed = components
    .filter((c) => c.massG !== undefined)
    .map((c) => `${c.massG!.toFixed(4)} g ${c.formula}`);
  const procedure = [
    `Dissolve ${weighed.join(", ")} in about 80 % of the final volume of water.`,
    ...(titrant
      ? [
          `Add ${titrant.volumeMl!.toFixed(2)} mL of ${stockMolar} mol/L ${titrant.formula} with stirring.`,
        ]
      : []),
    `Bring to ${conditions.temperatureC} °C, check the pH with a calibrated meter, and make up to ${input.volumeMl} mL with water.`,
  ];
  return {
    ...check,
    buffer: system.id,
    targetPH: input.pH,
    volumeMl: input.volumeMl,
    components,
    procedure,
    warnings,
    notes: [
      "Molalities are estimated from molarities with the density of water (dilute-solution approximation).",
      `pKa from ${system.source}, moved to ${conditions.temperatureC} °C with ΔrH° and ΔrCp°.`,
    ],
    cautions: cautionsFor(unknowns.map((u) => u.hazard)),
  };
}
