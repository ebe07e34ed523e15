// @vitest-environment node
import { describe, expect, it } from "vitest";
import { computeCellPotential } from "@/lib/document/evaluate-cell-block";
import { evaluateSolutionBlock } from "@/lib/document/evaluate-solution-block";
import { defaultCellBlockInput, defaultSolutionBlockInput } from "@/lib/document/block-defaults";

const acid = defaultSolutionBlockInput({
  name: "0.5 M H2SO4",
  components: [{ formula: "H2SO4", amount: 0.5, unit: "mol/L" }],
});

describe("computeCellPotential", () => {
  it("puts the hydrogen couple at 0 V vs RHE, with pH taken from the electrolyte", () => {
    const cell = defaultCellBlockInput({
      electrolyteBlockId: acid.blockId,
      couple: "H+/H2",
      referenceElectrode: { type: "RHE", material: "", areaCm2: null, pretreatment: [] },
    });
    const potential = computeCellPotential(cell, acid);
    if (potential.status !== "ok") throw new Error(JSON.stringify(potential));
    // The RHE is the H+/H2 couple in the same solution at 1 bar H2, so E vs RHE = 0 by
    // definition (common practice, no source); vs SHE it is −(RT ln10/F)·pH.
    expect(potential.vsReference).toBeCloseTo(0, 6);
    expect(potential.vsShe).toBeLessThan(0.05);
    expect(potential.notes.join(" ")).toMatch(/pH .* from the electrolyte/);
  });

  it("asks for a couple and an electrolyte before computing", () => {
    expect(computeCellPotential(defaultCellBlockInput(), acid).status).toBe("idle");
    expect(computeCellPotential(defaultCellBlockInput({ couple: "H+/H2" }), null).status).toBe(
      "idle",
    );
  });

  it("passes an engine refusal on to the cell, not a crash", () => {
    const cell = defaultCellBlockInput({ electrolyteBlockId: acid.blockId, couple: "Fe3+/Fe2+" });
    const potential = computeCellPotential(cell, acid);
    expect(potential.status).toBe("error");
    if (potential.status === "error") expect(potential.message).toMatch(/Fe/);
  });

  it("uses free-ion activities: the hexacyanoferrates pair with K+ and the note says how much", () => {
    const ferri = defaultSolutionBlockInput({
      name: "Ferri/ferro in KCl",
      model: "davies",
      components: [
        { formula: "KCl", amount: 0.1, unit: "mol/kg" },
        { formula: "K3Fe(CN)6", amount: 0.005, unit: "mol/kg" },
        { formula: "K4Fe(CN)6", amount: 0.005, unit: "mol/kg" },
      ],
    });
    const cell = defaultCellBlockInput({
      electrolyteBlockId: ferri.blockId,
      couple: "Fe(CN)6 3-/4-",
      temperatureC: 25,
    });
    const potential = computeCellPotential(cell, ferri);
    if (potential.status !== "ok") throw new Error(JSON.stringify(potential));
    const solution = evaluateSolutionBlock(ferri);
    if (solution.status !== "ok" || !solution.result.speciation) throw new Error("no speciation");
    const free = (f: string) => solution.result.speciation!.free.find((s) => s.formula === f)!;
    // Self-consistency: E = E° − (RT ln10/F) log10(a_red/a_ox) with the free activities the
    // block shows (the cell's own E° and slope; RT ln10/F = 0.05916 V at 25 °C, CODATA).
    const expected =
      potential.standardPotentialV -
      0.05916 * Math.log10(free("Fe(CN)6^4-").activity / free("Fe(CN)6^3-").activity);
    expect(potential.vsShe).toBeCloseTo(expected, 4);
    expect(free("Fe(CN)6^4-").molality).toBeLessThan(0.005 * 0.99);
    expect(potential.notes.join(" ")).toMatch(
      /Free-ion activities after ion association \(.*Fe\(CN\)6\^4- \d+ % paired/,
    );
  });
});
