// @vitest-environment node
/** The choice rules follow each model's documented range (see the model files and their sources). */
import { describe, expect, it } from "vitest";
import {
  ACTIVITY_MODELS,
  ChemInputError,
  MODEL_REGISTRY,
  chooseModel,
  computeSolution,
  type ModelIon,
} from "@/lib/chem";
import { DH_FAMILY_CANDIDATES } from "@/lib/chem/models/auto";

describe("model registry", () => {
  it("registers the Debye–Hückel family under the contract's ids", () => {
    for (const id of [
      "dh-limiting",
      "dh-extended",
      "guntelberg",
      "davies",
      "truesdell-jones",
    ] as const) {
      expect(MODEL_REGISTRY[id]?.id).toBe(id);
      expect(MODEL_REGISTRY[id]?.formulaTex).toMatch(/\\gamma_i/);
      expect(MODEL_REGISTRY[id]?.validityNote).toBeTruthy();
    }
  });

  it("lists models for the UI with labels and formulaTex, auto first", () => {
    expect(ACTIVITY_MODELS[0].id).toBe("auto");
    expect(ACTIVITY_MODELS.map((m) => m.id)).toEqual(
      expect.arrayContaining(["dh-limiting", "davies", "truesdell-jones"]),
    );
  });

  it("an unknown model id is a ChemInputError on 'model' that lists the available ones", () => {
    try {
      computeSolution({
        model: "magic" as "auto",
        components: [{ formula: "NaCl", amount: 1, unit: "mol/kg" }],
      });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ChemInputError);
      expect((error as ChemInputError).field).toBe("model");
      expect((error as ChemInputError).message).toMatch(/Available models: auto, dh-limiting/);
    }
  });
});

const dh = (ions: ModelIon[], ionicStrengthMolal: number, solvent = "water") =>
  chooseModel({ ions, ionicStrengthMolal, temperatureC: 25, solvent }, DH_FAMILY_CANDIDATES);
const ion = (formula: string, charge: number, molality: number): ModelIon => ({
  formula,
  charge,
  molality,
});

describe('model "auto" among the Debye–Hückel family: the most accurate that covers, and why', () => {
  it("Truesdell–Jones when every ion has a fitted b (NaCl to 2 mol/kg)", () => {
    const choice = dh([ion("Na+", 1, 1.5), ion("Cl-", -1, 1.5)], 1.5);
    expect(choice.id).toBe("truesdell-jones");
    expect(choice.reason).toMatch(/fitted Truesdell–Jones b/);
  });

  it("extended Debye–Hückel for dilute solutions of ions with Kielland sizes", () => {
    const choice = dh([ion("Cu^2+", 2, 0.01), ion("NO3-", -1, 0.02)], 0.03);
    expect(choice.id).toBe("dh-extended");
    expect(choice.reason).toMatch(/Kielland/);
  });

  it("Truesdell–Jones in b-dot form up to 0.1 mol/kg when sizes are tabulated but b is not fitted", () => {
    const inside = dh([ion("H+", 1, 0.08), ion("Cl-", -1, 0.08)], 0.08);
    expect(inside).toMatchObject({ id: "truesdell-jones", covered: true });
    // Beyond, no Debye–Hückel-family model is inside its range: the least poor one, said.
    const beyond = dh([ion("H+", 1, 0.3), ion("Cl-", -1, 0.3)], 0.3);
    expect(beyond).toMatchObject({ id: "truesdell-jones", covered: false });
  });

  it("Davies when some ion has no tabulated size", () => {
    const choice = dh([ion("Li+", 1, 0.04), ion("PF6-", -1, 0.04)], 0.04);
    expect(choice.id).toBe("davies");
    expect(choice.reason).toMatch(/Davies needs none/);
  });

  it("the limiting law for a dilute non-aqueous solution (needs only εr and ρ)", () => {
    const choice = dh([ion("N(C4H9)4+", 1, 5e-5), ion("PF6-", -1, 5e-5)], 5e-5, "acetonitrile");
    expect(choice.id).toBe("dh-limiting");
    expect(choice.reason).toMatch(/acetonitrile/);
  });

  it("says when nothing covers the composition", () => {
    const choice = dh([ion("Li+", 1, 3), ion("PF6-", -1, 3)], 3);
    expect(choice.covered).toBe(false);
    expect(choice.reason).toMatch(/no model covers this solution/);
    expect(choice.change).toMatch(/No model is inside its range here/);
  });
});

describe('computeSolution with model "auto" (whatever candidates are registered)', () => {
  it("reports requested, used and a reason, and uses a registered model", () => {
    for (const [formula, amount] of [
      ["NaCl", 1.5],
      ["LiPF6", 0.2],
      ["Cu(NO3)2", 0.01],
    ] as const) {
      const r = computeSolution({
        model: "auto",
        components: [{ formula, amount, unit: "mol/kg" }],
      });
      expect(r.model.requested).toBe("auto");
      expect(MODEL_REGISTRY[r.model.used]).toBeDefined();
      expect(r.model.reason.length).toBeGreaterThan(10);
    }
  });

  it("in a non-aqueous solvent never picks a water-only model when a dilute one fits", () => {
    const r = computeSolution({
      model: "auto",
      solvent: "acetonitrile",
      components: [{ formula: "TBAPF6", amount: 0.05, unit: "mM" }],
    });
    expect(r.model.used).toBe("dh-limiting");
  });
});
