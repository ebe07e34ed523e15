// @vitest-environment node
/**
 * Property-based tests (fast-check, fixed seed, counted runs) over every exported function of
 * lib/chem: for any input — plausible, odd or hostile — a call either returns a value in which
 * every number is finite, or throws the engine's typed error (ChemInputError); and it returns
 * within 10 ms of CPU time. Self-consistency properties: no outside values are involved.
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import * as chem from "@/lib/chem";
import { CATALOGUE_SALTS } from "@/lib/chem/species/catalogue";

const SEED = 20240611;
const CALL_BUDGET_MS = 10;

/** Every number reachable from a value is finite (functions and strings are skipped). */
function everyNumberFinite(value: unknown, seen = new Set<unknown>()): boolean {
  if (typeof value === "number") return Number.isFinite(value);
  if (value === null || typeof value !== "object" || seen.has(value)) return true;
  seen.add(value);
  if (Array.isArray(value)) return value.every((v) => everyNumberFinite(v, seen));
  return Object.values(value).every((v) => everyNumberFinite(v, seen));
}

interface Outcome {
  ms: number;
  kind: "value" | "typed-error";
}

/**
 * Runs `call` once and times it in CPU time of this process (the machine is shared: wall time
 * also counts the time other processes hold the cores).
 */
function timed(call: () => unknown): {
  ms: number;
  kind: Outcome["kind"];
  error?: unknown;
  value?: unknown;
} {
  const start = process.cpuUsage();
  const cpuMs = () => {
    const used = process.cpuUsage(start);
    return (used.user + used.system) / 1000;
  };
  try {
    const value = call();
    return { ms: cpuMs(), kind: "value", value };
  } catch (error) {
    return { ms: cpuMs(), kind: "typed-error", error };
  }
}

/**
 * Runs `call`; anything but a finite value or a ChemInputError fails the property. A call over
 * the budget is run once more (a garbage-collection pause of the shared machine is not the
 * call's time); it fails if the repeat is over the budget too.
 */
function check(label: string, call: () => unknown): Outcome {
  let run = timed(call);
  if (run.ms > CALL_BUDGET_MS) run = timed(call);
  if (run.kind === "typed-error" && !chem.isChemInputError(run.error)) throw run.error;
  if (run.kind === "value" && !everyNumberFinite(run.value))
    throw new Error(`${label}: a number in the result is not finite`);
  if (run.ms > CALL_BUDGET_MS) throw new Error(`${label}: took ${run.ms.toFixed(1)} ms`);
  return { ms: run.ms, kind: run.kind };
}

// ---- arbitraries ------------------------------------------------------------------------

const catalogueFormulas = CATALOGUE_SALTS.map((s) => s.formula);
const ionFormulas = [
  "Na+",
  "K+",
  "Ca^2+",
  "Mg^2+",
  "Cl-",
  "SO4^2-",
  "NO3-",
  "La^3+",
  "Fe(CN)6^4-",
  "H+",
  "OH-",
];
const oddNumber = fc.oneof(
  fc.double({ noNaN: false }),
  fc.constantFrom(0, -0, -1, 1e-300, 1e300, Number.NaN, Infinity, -Infinity, 1e6),
);
/** Values in [min, max] on a grid of 1/1000 (fc.double clusters at the bounds and at 1e-323). */
const plausible = (min: number, max: number) =>
  fc.integer({ min: Math.round(min * 1000), max: Math.round(max * 1000) }).map((x) => x / 1000);
/** Mostly plausible, sometimes odd: 4 to 1. */
const mostly = (arbitrary: fc.Arbitrary<number>) =>
  fc.oneof({ arbitrary, weight: 4 }, { arbitrary: oddNumber, weight: 1 });
const plausibleAmount = plausible(0.001, 8);
const formulaText = fc.oneof(
  fc.constantFrom(...catalogueFormulas, ...ionFormulas),
  fc.string({
    unit: fc.constantFrom(..."HCONaKClSOFe()[]{}0123456789+-^·.* ₂²⁻⁺ "),
    maxLength: 60,
  }),
  fc.string({ maxLength: 30 }),
  fc.constantFrom("Na" + "1".repeat(400), "(".repeat(50) + "H" + ")".repeat(50), "X".repeat(250)),
);
const unitText = fc.oneof(
  fc.constantFrom("mol/kg", "mmol/kg", "mol/L", "mM", "µM", "g/L", "wt%", "ppm", "M", "m"),
  fc.string({ maxLength: 12 }),
);
const component = fc.oneof(
  fc.record({ formula: formulaText, amount: mostly(plausibleAmount), unit: unitText }),
  fc.record({
    formula: fc.constantFrom(...catalogueFormulas),
    amount: fc.double({ min: 0, max: 50, noNaN: true }),
    unit: fc.constant("g"),
    per: fc.record({
      amount: mostly(plausible(1, 1000)),
      unit: fc.constantFrom("g", "mL", "L", "kg", "mol"),
    }),
  }),
);
const solutionInput = fc.record(
  {
    temperatureC: mostly(plausible(0, 100)),
    solvent: fc.constantFrom("water", "acetonitrile", "dmso", "methanol", "not-a-solvent"),
    model: fc.constantFrom(
      "auto",
      "dh-limiting",
      "dh-extended",
      "guntelberg",
      "davies",
      "truesdell-jones",
      "pitzer",
      "sit",
      "magic",
    ),
    components: fc.array(component, { minLength: 0, maxLength: 6 }),
    densityGPerMl: fc.option(mostly(plausible(0.9, 1.8)), {
      nil: undefined,
    }),
    ionAssociation: fc.boolean(),
  },
  { requiredKeys: ["components"] },
);

// ---- properties -------------------------------------------------------------------------

interface Property {
  name: string;
  runs: number;
  arbitrary: fc.Arbitrary<unknown>;
  call: (input: never) => unknown;
}

const couples = chem.listCouples().map((c) => c.id);
const probes = chem.listRedoxProbes().map((p) => p.id);
const references = chem.listReferenceElectrodes().map((r) => r.id);
const buffers = [
  "phosphate",
  "acetate",
  "citrate",
  "carbonate",
  "borate",
  "tris",
  "hepes",
  "mes",
  "mops",
];

const PROPERTIES: Property[] = [
  {
    name: "parseFormula",
    runs: 400,
    arbitrary: formulaText,
    call: (t: string) => chem.parseFormula(t),
  },
  { name: "molarMass", runs: 300, arbitrary: formulaText, call: (t: string) => chem.molarMass(t) },
  {
    name: "resolveSpecies",
    runs: 300,
    arbitrary: formulaText,
    call: (t: string) => chem.resolveSpecies(t),
  },
  {
    name: "searchSpecies",
    runs: 200,
    arbitrary: fc.oneof(fc.string({ maxLength: 40 }), fc.constantFrom("Na", "chlor", "TBA", "")),
    call: (q: string) => chem.searchSpecies(q),
  },
  {
    name: "computeSolution",
    runs: 600,
    arbitrary: solutionInput,
    call: (i: never) => chem.computeSolution(i),
  },
  {
    name: "debyeHuckelConstants",
    runs: 150,
    arbitrary: fc.tuple(oddNumber, fc.constantFrom("water", "acetonitrile", "nope")),
    call: ([t, s]: [number, string]) => chem.debyeHuckelConstants(t, s),
  },
  {
    name: "debyeHuckelConstantsFrom",
    runs: 150,
    arbitrary: fc.tuple(
      mostly(plausible(1, 100)),
      mostly(plausible(0.5, 2)),
      mostly(plausible(-40, 150)),
    ),
    call: ([e, r, t]: [number, number, number]) => chem.debyeHuckelConstantsFrom(e, r, t),
  },
  {
    name: "waterRelativePermittivity",
    runs: 100,
    arbitrary: oddNumber,
    call: (t: number) => chem.waterRelativePermittivity(t),
  },
  {
    name: "waterDensityGPerMl",
    runs: 100,
    arbitrary: oddNumber,
    call: (t: number) => chem.waterDensityGPerMl(t),
  },
  {
    name: "getModel",
    runs: 50,
    arbitrary: fc.string({ maxLength: 20 }),
    call: (id: string) => chem.getModel(id),
  },
  {
    name: "chooseModel",
    runs: 300,
    arbitrary: fc.record({
      ions: fc.array(
        fc.record({
          formula: fc.oneof(fc.constantFrom(...ionFormulas), fc.string({ maxLength: 10 })),
          charge: fc.oneof(fc.integer({ min: -4, max: 4 }), oddNumber),
          molality: mostly(plausibleAmount),
        }),
        { maxLength: 6 },
      ),
      ionicStrengthMolal: mostly(plausibleAmount),
      temperatureC: mostly(plausible(0, 100)),
      solvent: fc.constantFrom("water", "acetonitrile"),
    }),
    call: (c: never) => chem.chooseModel(c),
  },
  {
    name: "nernstPotentialDetailed",
    runs: 300,
    arbitrary: fc.record({
      couple: fc.oneof(fc.constantFrom(...couples), fc.string({ maxLength: 12 })),
      activities: fc.dictionary(
        fc.oneof(
          fc.constantFrom("Fe^3+", "Fe^2+", "Cl-", "H+", "OH-", "Cu^2+", "O2"),
          fc.string({ maxLength: 6 }),
        ),
        mostly(plausible(0.001, 10)),
      ),
      temperatureC: mostly(plausible(0, 100)),
      pH: fc.option(mostly(plausible(0, 14)), {
        nil: undefined,
      }),
    }),
    call: (i: never) => chem.nernstPotentialDetailed(i),
  },
  {
    name: "nernstSlopeV",
    runs: 100,
    arbitrary: fc.tuple(oddNumber, fc.oneof(fc.integer({ min: -2, max: 8 }), oddNumber)),
    call: ([t, n]: [number, number]) => chem.nernstSlopeV(t, n),
  },
  {
    name: "convertPotentialDetailed",
    runs: 300,
    arbitrary: fc.tuple(
      oddNumber,
      fc.oneof(fc.constantFrom(...references), fc.string({ maxLength: 8 })),
      fc.oneof(fc.constantFrom(...references), fc.string({ maxLength: 8 })),
      fc.record({ temperatureC: oddNumber, pH: fc.option(oddNumber, { nil: undefined }) }),
    ),
    call: ([v, a, b, o]: [number, string, string, chem.PotentialOptions]) =>
      chem.convertPotentialDetailed(v, a, b, o),
  },
  {
    name: "referencePotentialVsShe",
    runs: 100,
    arbitrary: fc.tuple(
      fc.oneof(fc.constantFrom(...references), fc.string({ maxLength: 8 })),
      oddNumber,
    ),
    call: ([id, t]: [string, number]) =>
      chem.referencePotentialVsShe(id, { temperatureC: t, pH: 7 }),
  },
  {
    name: "designBuffer",
    runs: 300,
    arbitrary: fc.record({
      buffer: fc.oneof(
        { arbitrary: fc.constantFrom(...buffers), weight: 4 },
        { arbitrary: fc.string({ maxLength: 8 }), weight: 1 },
      ),
      pH: mostly(plausible(0, 14)),
      totalConcentrationMolar: mostly(plausible(0.001, 0.5)),
      volumeMl: mostly(plausible(10, 1000)),
      temperatureC: fc.option(mostly(plausible(0, 100)), {
        nil: undefined,
      }),
      method: fc.constantFrom("two-forms", "titrate", undefined),
      targetIonicStrengthMolar: fc.option(mostly(plausible(0, 1)), {
        nil: undefined,
      }),
    }),
    call: (i: never) => chem.designBuffer(i),
  },
  {
    name: "speciate",
    runs: 300,
    arbitrary: fc.record({
      components: fc.array(
        fc.record({
          formula: fc.oneof(
            fc.constantFrom(
              "NaH2PO4",
              "Na2HPO4",
              "CH3COOH",
              "CH3COONa",
              "HCl",
              "NaOH",
              "NaCl",
              "Tris",
              "KCl",
            ),
            fc.string({ maxLength: 8 }),
          ),
          amountMol: fc.option(mostly(plausible(0.001, 0.5)), {
            nil: undefined,
          }),
        }),
        { maxLength: 4 },
      ),
      volumeMl: mostly(plausible(10, 1000)),
      temperatureC: fc.option(oddNumber, { nil: undefined }),
    }),
    call: (i: never) => chem.speciate(i),
  },
  // Electrochemistry of the traces work (conductivity, junctions, peaks): the same contract.
  {
    name: "waterViscosityMPaS",
    runs: 100,
    arbitrary: mostly(plausible(-10, 120)),
    call: (t: number) => chem.waterViscosityMPaS(t),
  },
  {
    name: "conductivityTemperatureRatio",
    runs: 100,
    arbitrary: mostly(plausible(-10, 120)),
    call: (t: number) => chem.conductivityTemperatureRatio(t),
  },
  {
    name: "limitingIonicConductivity",
    runs: 150,
    arbitrary: fc.tuple(
      fc.oneof(fc.constantFrom(...ionFormulas), formulaText),
      mostly(plausible(0, 100)),
    ),
    call: ([ion, t]: [string, number]) => chem.limitingIonicConductivity(ion, t),
  },
  {
    name: "onsagerCoefficients",
    runs: 100,
    arbitrary: mostly(plausible(0, 100)),
    call: (t: number) => chem.onsagerCoefficients(t),
  },
  {
    name: "electrolyteConductivity",
    runs: 200,
    arbitrary: fc.record({
      ions: fc.array(
        fc.record({
          formula: fc.oneof(fc.constantFrom(...ionFormulas), formulaText),
          concentrationMolPerL: mostly(plausible(0, 2)),
        }),
        { maxLength: 5 },
      ),
      temperatureC: fc.option(mostly(plausible(0, 100)), { nil: undefined }),
    }),
    call: (i: never) => chem.electrolyteConductivity(i),
  },
  {
    name: "liquidJunctionPotential",
    runs: 200,
    arbitrary: fc.record({
      fillingSolution: fc.array(
        fc.record({
          formula: fc.oneof(fc.constantFrom(...ionFormulas), formulaText),
          concentrationMolPerL: mostly(plausible(0, 4)),
        }),
        { maxLength: 4 },
      ),
      cellElectrolyte: fc.array(
        fc.record({
          formula: fc.oneof(fc.constantFrom(...ionFormulas), formulaText),
          concentrationMolPerL: mostly(plausible(0, 2)),
        }),
        { maxLength: 4 },
      ),
      temperatureC: fc.option(mostly(plausible(0, 100)), { nil: undefined }),
    }),
    call: (i: never) => chem.liquidJunctionPotential(i),
  },
  {
    name: "junctionCorrectedPotential",
    runs: 100,
    arbitrary: fc.tuple(oddNumber, oddNumber),
    call: ([e, j]: [number, number]) => chem.junctionCorrectedPotential(e, j),
  },
  {
    name: "referenceFillingSolution",
    runs: 50,
    arbitrary: fc.oneof(fc.constantFrom(...references), fc.string({ maxLength: 8 })),
    call: (id: never) => chem.referenceFillingSolution(id),
  },
  {
    name: "uncompensatedResistanceDisk",
    runs: 100,
    arbitrary: fc.record({
      radiusM: mostly(plausible(0.0001, 0.01)),
      conductivitySPerM: mostly(plausible(0.001, 20)),
    }),
    call: (i: never) => chem.uncompensatedResistanceDisk(i),
  },
  {
    name: "iRDrop",
    runs: 100,
    arbitrary: fc.record({ currentA: oddNumber, resistanceOhm: oddNumber }),
    call: (i: never) => chem.iRDrop(i),
  },
  {
    name: "findRedoxProbe",
    runs: 50,
    arbitrary: fc.oneof(fc.constantFrom(...probes), fc.string({ maxLength: 10 })),
    call: (id: string) => chem.findRedoxProbe(id),
  },
  {
    name: "diffusionCoefficient",
    runs: 150,
    arbitrary: fc.tuple(
      fc.oneof(fc.constantFrom(...probes), fc.string({ maxLength: 10 })),
      fc.constantFrom("oxidized", "reduced", "neither"),
      mostly(plausible(0, 100)),
    ),
    call: ([id, form, t]: [string, never, number]) => chem.diffusionCoefficient(id, form, t),
  },
  {
    name: "randlesSevcikPeakCurrent",
    runs: 150,
    arbitrary: fc.record({
      electrons: fc.option(fc.oneof(fc.integer({ min: -1, max: 4 }), oddNumber), {
        nil: undefined,
      }),
      electrodeAreaCm2: mostly(plausible(0.001, 2)),
      concentrationMolPerL: mostly(plausible(0.0001, 0.1)),
      diffusionCoefficientCm2PerS: mostly(plausible(0.000001, 0.0001)),
      scanRateVPerS: mostly(plausible(0.001, 10)),
      temperatureC: fc.option(mostly(plausible(0, 100)), { nil: undefined }),
    }),
    call: (i: never) => chem.randlesSevcikPeakCurrent(i),
  },
  {
    name: "reversiblePeakSeparationV",
    runs: 100,
    arbitrary: fc.tuple(fc.oneof(fc.integer({ min: -1, max: 4 }), oddNumber), oddNumber),
    call: ([n, t]: [number, number]) => chem.reversiblePeakSeparationV(n, t),
  },
  {
    name: "expectedPeakCurrent",
    runs: 150,
    arbitrary: fc.record({
      probe: fc.oneof(fc.constantFrom(...probes), fc.string({ maxLength: 10 })),
      formInSolution: fc.constantFrom("oxidized", "reduced"),
      electrodeAreaCm2: mostly(plausible(0.001, 2)),
      concentrationMolPerL: mostly(plausible(0.0001, 0.1)),
      scanRateVPerS: mostly(plausible(0.001, 10)),
      temperatureC: fc.option(mostly(plausible(0, 100)), { nil: undefined }),
    }),
    call: (i: never) => chem.expectedPeakCurrent(i),
  },
  {
    name: "judgeVoltammogram",
    runs: 200,
    arbitrary: fc.record({
      measured: fc.record({
        deltaEpV: fc.option(mostly(plausible(0, 0.5)), { nil: null }),
        anodicPeakCurrentA: fc.option(mostly(plausible(-0.001, 0.001)), { nil: null }),
        cathodicPeakCurrentA: fc.option(mostly(plausible(-0.001, 0.001)), { nil: null }),
      }),
      expected: fc.option(
        fc.record({
          peakCurrentA: mostly(plausible(0, 0.001)),
          forwardPeak: fc.constantFrom("anodic", "cathodic"),
        }),
        { nil: undefined },
      ),
      electrons: fc.option(fc.oneof(fc.integer({ min: -1, max: 4 }), oddNumber), {
        nil: undefined,
      }),
      temperatureC: fc.option(mostly(plausible(0, 100)), { nil: undefined }),
      uncompensatedResistanceOhm: fc.option(mostly(plausible(0, 1000)), { nil: undefined }),
    }),
    call: (i: never) => chem.judgeVoltammogram(i),
  },
];

// Functions without arguments: each returns finite data.
const CONSTANTS: [string, () => unknown][] = [
  ["listSolvents", () => chem.listSolvents()],
  ["listActivityModels", () => chem.listActivityModels()],
  ["listCouples", () => chem.listCouples()],
  ["listReferenceElectrodes", () => chem.listReferenceElectrodes()],
  ["ACTIVITY_MODELS", () => chem.ACTIVITY_MODELS],
  ["AUTO_CANDIDATES", () => chem.AUTO_CANDIDATES.map((c) => c.id)],
  ["MODEL_REGISTRY", () => Object.keys(chem.MODEL_REGISTRY)],
  ["listIonicConductivities", () => chem.listIonicConductivities()],
  ["listRedoxProbes", () => chem.listRedoxProbes()],
];

describe("every exported function of lib/chem: finite results or typed errors, each call under 10 ms", () => {
  beforeAll(() => {
    // Warm-up: module-level tables, mathjs units and the JIT, so that timing measures the call.
    for (let k = 0; k < 30; k++) {
      chem.computeSolution({
        components: [{ formula: "NaCl", amount: 0.1 + k * 1e-3, unit: "mM" }],
      });
      chem.designBuffer({
        buffer: "phosphate",
        pH: 7,
        totalConcentrationMolar: 0.1,
        volumeMl: 100,
      });
    }
  });

  for (const p of PROPERTIES) {
    it(`${p.name}: ${p.runs} runs`, () => {
      let runs = 0;
      let values = 0;
      fc.assert(
        fc.property(p.arbitrary, (input) => {
          runs++;
          if (check(p.name, () => p.call(input as never)).kind === "value") values++;
        }),
        { seed: SEED, numRuns: p.runs },
      );
      expect(runs).toBe(p.runs);
      // The property is not only exercising error paths.
      if (p.name !== "getModel" && p.name !== "nernstSlopeV") expect(values).toBeGreaterThan(0);
    });
  }

  it("functions without arguments return finite data", () => {
    for (const [name, call] of CONSTANTS) expect(check(name, call).kind, name).toBe("value");
    expect(CONSTANTS).toHaveLength(9);
  });

  it("covers every function exported from lib/chem/index.ts", () => {
    const covered = new Set([
      ...PROPERTIES.map((p) => p.name),
      ...CONSTANTS.map(([n]) => n),
      // Thin wrappers whose detailed form is covered above, and the error helpers.
      "nernstPotential",
      "convertPotential",
      "ChemInputError",
      "isChemInputError",
    ]);
    const exported = Object.entries(chem)
      .filter(([, v]) => typeof v === "function" || typeof v === "object")
      .map(([k]) => k);
    expect(exported.filter((name) => !covered.has(name))).toEqual([]);
  });
});
