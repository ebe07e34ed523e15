// @vitest-environment node
import { describe, expect, it } from "vitest";
import { computeCellPotential } from "@/lib/document/evaluate-cell-block";
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
});
