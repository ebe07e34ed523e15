// @vitest-environment node
import { describe, expect, it } from "vitest";
import {
  ChemInputError,
  computeSolution,
  type ActivityModelId,
  type SolutionInput,
} from "@/lib/chem";
import { CATALOGUE_SALTS } from "@/lib/chem/species/catalogue";
import { readFixture } from "../../support/read-reference";

function errorOf(input: SolutionInput): ChemInputError {
  try {
    computeSolution(input);
  } catch (error) {
    if (error instanceof ChemInputError) return error;
    throw error;
  }
  throw new Error("expected a ChemInputError");
}

describe("the computation contract (DESIGN.md)", () => {
  const result = computeSolution({
    temperatureC: 25,
    solvent: "water",
    model: "auto",
    components: [
      { formula: "NaCl", amount: 0.1, unit: "mol/kg" },
      { formula: "CuSO4·5H2O", amount: 1.25, unit: "g", per: { amount: 50, unit: "mL" } },
    ],
  });

  it("has the contract's field names", () => {
    expect(Object.keys(result.ionicStrength).sort()).toEqual(["molal", "molar"]);
    expect(typeof result.debyeLengthNm).toBe("number");
    expect(typeof result.kappaPerNm).toBe("number");
    for (const key of [
      "formula",
      "charge",
      "molality",
      "molarity",
      "gamma",
      "activity",
      "log10Gamma",
      "lnGamma",
    ])
      expect(result.ions[0]).toHaveProperty(key);
    for (const key of ["formula", "meanGamma", "meanActivity", "log10MeanGamma", "lnMeanGamma"])
      expect(result.salts[0]).toHaveProperty(key);
    expect(Object.keys(result.model).sort()).toEqual(["label", "reason", "requested", "used"]);
    expect(result.validity).toEqual({ ok: expect.any(Boolean), messages: expect.any(Array) });
    expect(Array.isArray(result.warnings)).toBe(true);
    expect(Array.isArray(result.hazards)).toBe(true);
    expect(result.ions.map((i) => i.formula)).toEqual(["Na+", "Cl-", "Cu^2+", "SO4^2-"]);
    expect(result.salts.map((s) => s.formula)).toEqual(["NaCl", "CuSO4"]);
  });

  it("reports log10 and ln consistently, and activity = γ m", () => {
    for (const ion of result.ions) {
      expect(ion.lnGamma).toBeCloseTo(ion.log10Gamma * Math.LN10, 12);
      expect(ion.activity).toBeCloseTo(ion.gamma * ion.molality, 14);
    }
  });

  it("mean quantities: CaCl2 has m± = 4^(1/3) m and γ± = (γ₊ γ₋²)^(1/3) (CRC table header definition)", () => {
    const r = computeSolution({
      model: "dh-extended",
      components: [{ formula: "CaCl2", amount: 0.01, unit: "mol/kg" }],
    });
    const [ca, cl] = r.ions;
    expect(r.salts[0].meanMolality).toBeCloseTo(0.01 * 4 ** (1 / 3), 12);
    expect(r.salts[0].meanGamma).toBeCloseTo((ca.gamma * cl.gamma ** 2) ** (1 / 3), 12);
    expect(r.salts[0].meanActivity).toBeCloseTo(r.salts[0].meanGamma * r.salts[0].meanMolality, 14);
  });

  it("substitutes the solution's own numbers into the model's formula for KaTeX", () => {
    const r = computeSolution({
      model: "davies",
      components: [{ formula: "KCl", amount: 0.05, unit: "mol/kg" }],
    });
    expect(r.formulaTex).toContain("0.5108");
    expect(r.formulaTex).toContain("0.05");
    expect(r.formulaTexGeneral).toContain("A z_i^2");
  });

  it("osmotic coefficient and water activity: NaCl with Truesdell–Jones against Pitzer, Peiper & Busey (1984) φ and PHREEQC a_w", () => {
    const phi = readFixture("gamma-binary.csv").filter(
      (r) =>
        r.salt === "NaCl" &&
        r.temperature_C === "25" &&
        r.osmotic_coeff &&
        Number(r.molality_mol_per_kg) >= 0.1 &&
        Number(r.molality_mol_per_kg) <= 2,
    );
    expect(phi.length).toBe(6);
    for (const row of phi) {
      const r = computeSolution({
        model: "truesdell-jones",
        components: [{ formula: "NaCl", amount: Number(row.molality_mol_per_kg), unit: "mol/kg" }],
      });
      expect(Math.abs(r.osmoticCoefficient! / Number(row.osmotic_coeff) - 1)).toBeLessThan(0.01);
    }
    // PHREEQC 3.1.4 pitzer.dat a_w as recorded in pyEQL's tests (worked_examples.md §9): model outputs, 0.002 tolerance
    for (const [m, aw] of [
      [0.1, 0.997],
      [0.5, 0.984],
      [1, 0.967],
      [2, 0.932],
    ]) {
      const r = computeSolution({
        model: "truesdell-jones",
        components: [{ formula: "NaCl", amount: m, unit: "mol/kg" }],
      });
      expect(Math.abs(r.waterActivity! - aw)).toBeLessThan(0.002);
    }
  });

  it("limiting law: φ = 1 − (ln10/3) A |z₊z₋| √I for a 1:1 salt (Gibbs–Duhem, Debye & Hückel 1923)", () => {
    const r = computeSolution({
      model: "dh-limiting",
      components: [{ formula: "NaCl", amount: 0.004, unit: "mol/kg" }],
    });
    expect(r.osmoticCoefficient).toBeCloseTo(
      1 - (Math.LN10 / 3) * r.constants.aLog10 * Math.sqrt(0.004),
      8,
    );
  });

  it("hazards of combinations: hexacyanoferrate with acid, perchlorate in an organic solvent", () => {
    const acid = computeSolution({
      components: [
        { formula: "K3Fe(CN)6", amount: 5, unit: "mM" },
        { formula: "HCl", amount: 0.1, unit: "M" },
      ],
    });
    expect(acid.hazards.join(" ")).toMatch(/HCN/);
    const organic = computeSolution({
      solvent: "acetonitrile",
      components: [{ formula: "TBAP", amount: 0.1, unit: "M" }],
    });
    expect(organic.hazards.join(" ")).toMatch(/never evaporate to dryness/);
  });

  it("non-aqueous solvents: water-fitted parameters say so", () => {
    const r = computeSolution({
      solvent: "dmso",
      model: "dh-extended",
      components: [{ formula: "LiClO4", amount: 0.01, unit: "M" }],
    });
    expect(r.validity.ok).toBe(false);
    expect(r.validity.messages.join(" ")).toMatch(/fitted for water/);
    expect(r.solvent.relativePermittivity).toBeCloseTo(46.45, 2);
  });
});

describe("bad input is a typed error with a chemist's message", () => {
  it.each<[string, SolutionInput, string, RegExp]>([
    [
      "unknown species",
      { components: [{ formula: "Unobtainium", amount: 1, unit: "mol/kg" }] },
      "components[0].formula",
      /element symbol|not in the species catalogue/,
    ],
    [
      "species that cannot dissociate",
      { components: [{ formula: "SiO2", amount: 1, unit: "mol/kg" }] },
      "components[0].formula",
      /cannot be inferred/,
    ],
    ["empty solution", { components: [] }, "components", /no components/],
    [
      "missing formula",
      { components: [{ formula: "", amount: 1, unit: "M" }] },
      "components[0].formula",
      /no formula/,
    ],
    [
      "water above 100 °C",
      { temperatureC: 120, components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }] },
      "temperatureC",
      /outside the range of the water correlations/,
    ],
    [
      "DMSO below its melting point",
      {
        temperatureC: 10,
        solvent: "DMSO",
        components: [{ formula: "LiCl", amount: 1, unit: "mM" }],
      },
      "temperatureC",
      /liquid range of dimethyl sulfoxide/,
    ],
    [
      "temperature not a number",
      { temperatureC: Number.NaN, components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }] },
      "temperatureC",
      /must be a number/,
    ],
    [
      "unknown solvent",
      { solvent: "brine of the sea", components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }] },
      "solvent",
      /Unknown solvent/,
    ],
    [
      "unknown model",
      {
        model: "magic" as ActivityModelId,
        components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }],
      },
      "model",
      /Unknown activity model/,
    ],
    [
      "implausible density",
      { densityGPerMl: -1, components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }] },
      "densityGPerMl",
      /not plausible/,
    ],
    [
      "bad Davies coefficient",
      {
        model: "davies",
        modelOptions: { daviesCoefficient: 0.5 as 0.3 },
        components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }],
      },
      "modelOptions.daviesCoefficient",
      /0.3 or 0.2/,
    ],
  ])("%s", (_what, input, field, message) => {
    const error = errorOf(input);
    expect(error.field).toBe(field);
    expect(error.message).toMatch(message);
  });
});

describe("no NaN or Infinity ever reaches the output", () => {
  // Deterministic pseudo-random solutions (linear congruential generator, fixed seed).
  let seed = 12345;
  const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
  const salts = CATALOGUE_SALTS.map((s) => s.formula);
  const models: (ActivityModelId | "auto")[] = [
    "auto",
    "dh-limiting",
    "dh-extended",
    "guntelberg",
    "davies",
    "truesdell-jones",
  ];

  function assertFinite(value: unknown, path: string): void {
    if (typeof value === "number") {
      if (!Number.isFinite(value)) throw new Error(`${path} = ${value}`);
    } else if (Array.isArray(value)) value.forEach((v, i) => assertFinite(v, `${path}[${i}]`));
    else if (value && typeof value === "object")
      for (const [k, v] of Object.entries(value)) assertFinite(v, `${path}.${k}`);
  }

  it("300 random solutions: every model, 0–100 °C, 0 to 6 mol/kg, several units", () => {
    for (let n = 0; n < 300; n++) {
      const components = Array.from({ length: 1 + Math.floor(next() * 5) }, () => ({
        formula: salts[Math.floor(next() * salts.length)],
        amount: next() < 0.05 ? 0 : 10 ** (-9 + next() * 9.7),
        unit: next() < 0.5 ? "mol/kg" : "mol/L",
      }));
      const input = {
        temperatureC: Math.round(next() * 100),
        model: models[n % models.length],
        components,
      };
      let result;
      try {
        result = computeSolution(input);
      } catch (error) {
        if (error instanceof ChemInputError && error.field === "components") continue; // more solute than solution
        throw error;
      }
      assertFinite(result, `solution ${n}`);
    }
  });

  it("all-zero amounts: I = 0, γ = 1", () => {
    const r = computeSolution({ components: [{ formula: "NaCl", amount: 0, unit: "mol/kg" }] });
    expect(r.ions.every((i) => i.gamma === 1)).toBe(true);
    expect(r.debyeLengthNm).toBeNull();
  });
});
