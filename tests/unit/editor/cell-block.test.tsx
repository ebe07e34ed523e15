import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import { NotebookEditor } from "@/editor/notebook-editor";
import { findTemplate } from "@/lib/document/templates";
import { preloadBlockPanels } from "../../support/preload-blocks";
import { parseShownNumber } from "@/lib/ui/format-number";

afterEach(cleanup);
beforeAll(preloadBlockPanels, 60000);

const volts = (element: HTMLElement) =>
  Number((element.textContent ?? "").replace("−", "-").replace(/[^\d.+-]/g, ""));

/** Activity as the ion table shows it, e.g. "2.217 × 10⁻⁴". */
function shownActivity(row: HTMLElement): number {
  const cells = within(row).getAllByRole("cell");
  const text = cells[cells.length - 1].textContent ?? "";
  const value = parseShownNumber(text);
  if (value === null) throw new Error(`unreadable activity "${text}"`);
  return value;
}

describe("cell block", () => {
  it("shows the couple's equilibrium potential at the linked solution's activities, vs the reference and vs SHE", async () => {
    render(<NotebookEditor initialContent={findTemplate("cell-preparation")!.build()} />);
    const cell = await screen.findByRole(
      "region",
      { name: "Cell block Cell 1" },
      { timeout: 10000 },
    );
    const solution = screen.getByRole("region", {
      name: "Solution block Supporting electrolyte A",
    });
    expect(within(cell).getByRole("combobox", { name: "Electrolyte" })).toHaveDisplayValue(
      "Supporting electrolyte A",
    );

    const vsShe = volts(await within(cell).findByTestId("potential-vs-she"));
    const vsRef = volts(within(cell).getByTestId("potential-vs-reference"));
    const ions = within(solution).getByRole("table", { name: "Ions" });
    const aOx = shownActivity(
      within(ions).getByRole("rowheader", { name: "Fe(CN)6^3-" }).closest("tr")!,
    );
    const aRed = shownActivity(
      within(ions).getByRole("rowheader", { name: "Fe(CN)6^4-" }).closest("tr")!,
    );
    // Nernst: E = E° − (RT ln10/F) log10(a_red/a_ox), E° = +0.358 V (CRC Handbook, 92nd ed.,
    // Electrochemical Series) and RT ln10/F = 0.05916 V at 25 °C (CODATA constants).
    expect(vsShe).toBeCloseTo(0.358 - 0.05916 * Math.log10(aRed / aOx), 3);
    // The more highly charged ferrocyanide has the smaller γ, so E sits above E°.
    expect(vsShe).toBeGreaterThan(0.358);
    // Ag/AgCl in 3 M KCl is +0.210 V vs SHE at 25 °C (Bard & Faulkner, Electrochemical Methods, 2nd ed.).
    expect(vsShe - vsRef).toBeCloseTo(0.21, 3);
  });

  it("follows a change of reference electrode and says when the electrolyte link is missing", async () => {
    const user = userEvent.setup();
    render(<NotebookEditor initialContent={findTemplate("cell-preparation")!.build()} />);
    const cell = await screen.findByRole(
      "region",
      { name: "Cell block Cell 1" },
      { timeout: 10000 },
    );
    const vsShe = volts(await within(cell).findByTestId("potential-vs-she"));
    await user.selectOptions(within(cell).getByRole("combobox", { name: "Type" }), "SCE");
    // SCE is +0.2412 V vs SHE at 25 °C (Bard & Faulkner, 2nd ed.).
    await waitFor(() =>
      expect(vsShe - volts(within(cell).getByTestId("potential-vs-reference"))).toBeCloseTo(
        0.2412,
        3,
      ),
    );

    await user.selectOptions(within(cell).getByRole("combobox", { name: "Electrolyte" }), "");
    expect(within(cell).queryByTestId("potential-vs-she")).not.toBeInTheDocument();
    expect(within(cell).getByText(/Link the electrolyte/)).toBeInTheDocument();
  });

  it("shows the junction, conductivity, R_u and the expected peak current of a chosen probe, and applies the junction on request", async () => {
    const user = userEvent.setup();
    render(<NotebookEditor initialContent={findTemplate("cell-preparation")!.build()} />);
    const cell = await screen.findByRole(
      "region",
      { name: "Cell block Cell 1" },
      { timeout: 10000 },
    );
    // Without a radius R_u comes from the geometric area (0.0707 cm², a 1.5 mm disk).
    const resistance = within(cell).getByTestId("uncompensated-resistance");
    expect(within(resistance).getByTestId("value")).toHaveTextContent(/r = 1\.50 mm/);
    expect(within(resistance).getByText(/from the geometric area/)).toBeInTheDocument();
    await user.type(within(cell).getByRole("textbox", { name: /Disk radius/ }), "1.5");
    await waitFor(() =>
      expect(within(resistance).queryByText(/from the geometric area/)).not.toBeInTheDocument(),
    );
    // The stated range of the conductivity estimate, and that 0.18 mol/L is beyond it.
    const conductivity = within(cell).getByTestId("electrolyte-conductivity");
    expect(within(conductivity).getByText(/Valid range: Checked for 1:1/)).toBeInTheDocument();
    expect(within(conductivity).getByText(/above 0\.1 mol\/L/)).toBeInTheDocument();

    await user.selectOptions(
      within(cell).getByRole("combobox", { name: "Redox probe" }),
      "ferricyanide/ferrocyanide",
    );
    const peak = within(cell).getByTestId("expected-peak-current");
    // Randles–Ševčík, 25 °C form 2.69×10⁵ n^{3/2} A D^½ C v^½ (Bard & Faulkner 2001,
    // eq. 6.2.19): 5 mM ferrocyanide from the solution, D 6.7×10⁻⁶ cm²/s (Konopka &
    // McDuffie 1970, from memory), 0.0707 cm², 100 mV/s → 77.8 µA (the constant is rounded).
    await waitFor(() => expect(within(peak).getByTestId("value")).toHaveTextContent(/ip 77\.7 µA/));
    expect(
      within(peak).getByText(/Concentration of Fe\(CN\)6\^4- from the linked solution/),
    ).toBeInTheDocument();
    // Formulas applied, in KaTeX.
    expect(peak.querySelectorAll(".katex").length).toBeGreaterThanOrEqual(2);

    const before = volts(within(cell).getByTestId("potential-vs-reference"));
    const junctionText = within(within(cell).getByTestId("junction-potential")).getByTestId(
      "value",
    ).textContent;
    const junctionMv = Number(/([−+][\d.]+) mV/.exec(junctionText)![1].replace("−", "-"));
    await user.click(within(cell).getByRole("checkbox", { name: /Include it in potentials/ }));
    await waitFor(() =>
      expect(within(cell).getByText(/\(junction included\)/)).toBeInTheDocument(),
    );
    // A reading against the reference contains +Ej (Henderson; lib/chem junction-potential).
    expect(volts(within(cell).getByTestId("potential-vs-reference")) - before).toBeCloseTo(
      junctionMv / 1000,
      3,
    );
  });
});
