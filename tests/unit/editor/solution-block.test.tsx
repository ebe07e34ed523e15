import { cleanup, render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { Editor, JSONContent } from "@tiptap/core";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { NotebookEditor } from "@/editor/notebook-editor";
import { defaultSolutionBlockInput } from "@/lib/document/block-defaults";
import { extractSolutionBlocks } from "@/lib/document/extract-blocks";
import { parseShownNumber } from "@/lib/ui/format-number";
import { preloadBlockPanels } from "../../support/preload-blocks";

afterEach(cleanup);
beforeAll(preloadBlockPanels, 60000);

const docWith = (attrs: object): JSONContent => ({
  type: "doc",
  content: [
    {
      type: "paragraph",
      content: [{ type: "text", text: "Background electrolyte for the CV series." }],
    },
    { type: "solutionBlock", attrs },
  ],
});

async function mount(attrs: object) {
  let editor: Editor | undefined;
  const onChange = vi.fn<(doc: JSONContent) => void>();
  render(
    <NotebookEditor
      initialContent={docWith(attrs)}
      onChange={onChange}
      onEditorReady={(e) => (editor = e)}
    />,
  );
  const block = await screen.findByRole("region", { name: /Solution block/ }, { timeout: 10000 });
  await waitFor(() => expect(editor).toBeDefined());
  return { block, onChange, editor: editor as Editor };
}

/** Reads a number as the block shows it ("0.1000", "1.000 × 10⁻³"), for comparison. */
function shownNumber(element: HTMLElement): number {
  const text = (element.textContent ?? "")
    .replace(/^.*=\s*/, "")
    .replace(/\s*(mol\/kg|mol\/L|nm)$/, "");
  return parseShownNumber(text) ?? Number.NaN;
}

const nacl = (amount: number) =>
  defaultSolutionBlockInput({
    name: "Supporting electrolyte A",
    model: "davies",
    components: [{ formula: "NaCl", amount, unit: "mol/kg" }],
  });

describe("solution block", () => {
  it("turns a weighed hydrate into molarity with its molar mass as weighed", async () => {
    const { block } = await mount(
      defaultSolutionBlockInput({
        name: "Copper stock",
        components: [
          { formula: "CuSO4·5H2O", amount: 1.2484, unit: "g", perAmount: 50, perUnit: "mL" },
        ],
      }),
    );
    const row = within(within(block).getByRole("table", { name: "Per component" })).getAllByRole(
      "row",
    )[1];
    const cells = within(row).getAllByRole("cell");
    // M(CuSO4·5H2O) = 249.68 g/mol from IUPAC 2021 standard atomic weights (CIAAW);
    // 1.2484 g in 50 mL is then 0.1000 mol/L.
    expect(Number(cells[0].textContent)).toBeCloseTo(249.68, 1);
    expect(Number(cells[2].textContent)).toBeCloseTo(0.1, 3);
  });

  it("updates ionic strength and γ± as a concentration is typed", async () => {
    const user = userEvent.setup();
    const { block, onChange } = await mount(nacl(0.01));
    const ionicStrength = () => within(block).getByTestId("result-Ionic strength (molal)");
    const meanGamma = () => within(block).getByTestId("mean-gamma-NaCl");
    // For a 1:1 salt I equals its molality (I = ½ Σ mᵢ zᵢ², common practice, no source).
    expect(shownNumber(ionicStrength())).toBeCloseTo(0.01, 6);
    const gammaAtTenMillimolal = shownNumber(meanGamma());

    const amount = within(block).getByRole("textbox", { name: "Amount, row 1" });
    await user.clear(amount);
    await user.type(amount, "0.1");

    await waitFor(() => expect(shownNumber(ionicStrength())).toBeCloseTo(0.1, 6));
    // γ±(NaCl, 0.1 mol/kg, 25 °C) = 0.778: Robinson & Stokes, Electrolyte Solutions (1959),
    // Appendix 8.10. Davies is within 1 % of it at this ionic strength.
    expect(shownNumber(meanGamma())).toBeGreaterThan(0.768);
    expect(shownNumber(meanGamma())).toBeLessThan(0.788);
    expect(shownNumber(meanGamma())).toBeLessThan(gammaAtTenMillimolal);
    // The document keeps only the inputs; the number typed is what is saved.
    const saved = extractSolutionBlocks(onChange.mock.lastCall![0]);
    expect(saved[0].components[0].amount).toBe(0.1);
    expect(JSON.stringify(onChange.mock.lastCall![0])).not.toMatch(/ionicStrength|meanGamma/);
  });

  it("marks a negative amount in place with the engine's message and keeps the rest working", async () => {
    const user = userEvent.setup();
    const { block } = await mount(
      defaultSolutionBlockInput({
        name: "Mixed",
        components: [
          { formula: "KCl", amount: 0.1, unit: "mol/kg" },
          { formula: "NaClO4", amount: 0.05, unit: "mol/kg" },
        ],
      }),
    );
    const second = within(block).getByRole("textbox", { name: "Amount, row 2" });
    await user.clear(second);
    await user.type(second, "-0.05");
    await waitFor(() => expect(second).toHaveAttribute("aria-invalid", "true"));
    expect(second).toHaveAccessibleDescription(/negative/i);
    expect(within(block).getByRole("textbox", { name: "Amount, row 1" })).not.toHaveAttribute(
      "aria-invalid",
    );
    expect(
      within(block).getByText(/Results paused until the amount in row 2 is corrected/),
    ).toBeInTheDocument();
    // Hazard notes and the general caution stay visible while the input is refused.
    expect(within(block).getByRole("region", { name: "Hazard notes" })).toHaveTextContent(
      /perchlorate/i,
    );
    expect(within(block).getByText(/safety data sheet/i)).toBeInTheDocument();
    // Correcting the field brings the results back.
    await user.clear(second);
    await user.type(second, "0.05");
    await waitFor(() => expect(second).not.toHaveAttribute("aria-invalid"));
    expect(shownNumber(within(block).getByTestId("result-Ionic strength (molal)"))).toBeCloseTo(
      0.15,
      6,
    );
  });

  it("marks a temperature outside water's range on the temperature field", async () => {
    const user = userEvent.setup();
    const { block } = await mount(nacl(0.1));
    const temperature = within(block).getByRole("textbox", { name: /Temperature/ });
    await user.clear(temperature);
    await user.type(temperature, "150");
    await waitFor(() => expect(temperature).toHaveAccessibleDescription(/outside/i));
  });

  it("adds a row with Enter on the last row and removes an empty row with Ctrl+Backspace", async () => {
    const user = userEvent.setup();
    const { block } = await mount(nacl(0.1));
    await user.click(within(block).getByRole("textbox", { name: "Amount, row 1" }));
    await user.keyboard("{Enter}");
    const species2 = await within(block).findByRole("combobox", { name: "Species, row 2" });
    await waitFor(() => expect(species2).toHaveFocus());
    await user.keyboard("{Control>}{Backspace}{/Control}");
    await waitFor(() =>
      expect(
        within(block).queryByRole("combobox", { name: "Species, row 2" }),
      ).not.toBeInTheDocument(),
    );
    expect(within(block).getByRole("combobox", { name: "Species, row 1" })).toHaveFocus();
  });

  it("offers catalogue species by formula and by name", async () => {
    const user = userEvent.setup();
    const { block } = await mount(
      defaultSolutionBlockInput({ components: [{ formula: "", amount: null, unit: "mol/kg" }] }),
    );
    const species = within(block).getByRole("combobox", { name: "Species, row 1" });
    await user.type(species, "potassium chlo");
    const list = await within(block).findByRole("listbox");
    expect(within(list).getAllByRole("option")[0]).toHaveTextContent("KCl");
    await user.keyboard("{Enter}");
    expect(species).toHaveValue("KCl");
  });
});
