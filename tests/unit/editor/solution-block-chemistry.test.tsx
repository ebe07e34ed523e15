import { cleanup, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { useState } from "react";
import { afterEach, describe, expect, it, vi } from "vitest";
import { SolutionBlockPanel } from "@/editor/solution-block/solution-block-panel";
import type { SolutionBlockInput } from "@/lib/document/block-schemas";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { computeSolution } from "@/lib/chem";
import { parseShownNumber } from "@/lib/ui/format-number";

afterEach(cleanup);

/** The panel with its inputs held in state, as the editor's node view holds them. */
function Harness({
  initial,
  onChange,
}: {
  initial: SolutionBlockInput;
  onChange?: (next: SolutionBlockInput) => void;
}) {
  const [value, setValue] = useState(initial);
  return (
    <SolutionBlockPanel
      value={value}
      onChange={(next) => {
        onChange?.(next);
        setValue(next);
      }}
    />
  );
}

/** A number as the block shows it ("I = 0.0100 mol/kg", "1.000 × 10⁻³"). */
const shown = (element: HTMLElement) =>
  parseShownNumber(
    (element.textContent ?? "").replace(/^.*=\s*/, "").replace(/\s*(mol\/kg|mol\/L|nm)$/, ""),
  ) ?? Number.NaN;

describe("solution block: ion association, density, model change, charge balance", () => {
  it("shows free ions and ion pairs, and the salts' γ± as stoichiometric values", () => {
    render(
      <Harness
        initial={defaultSolutionBlockInput({
          name: "Magnesium sulfate",
          model: "davies",
          components: [{ formula: "MgSO4", amount: 0.01, unit: "mol/kg" }],
        })}
      />,
    );
    const table = screen.getByRole("table", { name: /Free ions and ion pairs/ });
    const pair = within(table).getByRole("rowheader", { name: "MgSO4(aq)" }).closest("tr")!;
    expect(within(pair).getByText(/pair of/)).toBeInTheDocument();
    // The block shows what lib/chem computed (self-consistency; the chemistry is tested in
    // tests/unit/chem/ion-association.test.ts).
    const r = computeSolution({
      model: "davies",
      components: [{ formula: "MgSO4", amount: 0.01, unit: "mol/kg" }],
    });
    const pairMolality = r.speciation!.pairs.find((p) => p.formula === "MgSO4(aq)")!.molality;
    expect(shown(within(table).getByTestId("species-molality-MgSO4(aq)"))).toBeCloseTo(
      pairMolality,
      6,
    );
    expect(screen.getByRole("columnheader", { name: "γ± (stoichiometric)" })).toBeInTheDocument();
    expect(shown(screen.getByTestId("mean-gamma-MgSO4"))).toBeCloseTo(r.salts[0].meanGamma, 3);
  });

  it("says which density converted mol/L to mol/kg", () => {
    render(
      <Harness
        initial={defaultSolutionBlockInput({
          name: "Reference filling solution",
          components: [{ formula: "KCl", amount: 3, unit: "mol/L" }],
        })}
      />,
    );
    expect(screen.getByTestId("density-used")).toHaveTextContent(
      /g\/mL from the density model of Laliberté & Cooper \(2004\)/,
    );
  });

  it("shows the model change and its reason once, apart from the range messages", () => {
    render(
      <Harness
        initial={defaultSolutionBlockInput({
          name: "Brine",
          model: "auto",
          components: [{ formula: "NaCl", amount: 6.5, unit: "mol/kg" }],
        })}
      />,
    );
    const change = screen.getByRole("region", { name: "Model changed" });
    expect(change).toHaveTextContent(/No model is inside its range here.*Pitzer is extrapolated/);
    const range = screen.queryByRole("region", { name: "Outside the model's range" });
    expect(range?.textContent ?? "").not.toMatch(/No model is inside its range here/);
  });

  it("offers a counter-ion of the researcher's choice and appends it as a component row", async () => {
    const user = userEvent.setup();
    const onChange = vi.fn<(next: SolutionBlockInput) => void>();
    render(
      <Harness
        initial={defaultSolutionBlockInput({
          name: "Unbalanced",
          model: "davies",
          components: [{ formula: "Na+", amount: 0.01, unit: "mol/kg" }],
        })}
        onChange={onChange}
      />,
    );
    const offer = screen.getByRole("group", { name: "Balance the charge" });
    await user.selectOptions(within(offer).getByRole("combobox", { name: "Balance with" }), [
      "nitrate (NO3-)",
    ]);
    await user.click(within(offer).getByRole("button", { name: "Add counter-ion" }));
    expect(onChange).toHaveBeenCalledTimes(1);
    expect(onChange.mock.lastCall![0].components).toEqual([
      { formula: "Na+", amount: 0.01, unit: "mol/kg" },
      { formula: "NO3-", amount: 0.01, unit: "mol/kg" },
    ]);
    // Balanced now: the offer is gone and the ionic strength is that of 0.01 mol/kg NaNO3.
    expect(screen.queryByRole("group", { name: "Balance the charge" })).not.toBeInTheDocument();
    expect(shown(screen.getByTestId("result-Ionic strength (molal)"))).toBeCloseTo(0.01, 6);
  });
});
