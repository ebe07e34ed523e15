import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, it } from "vitest";
import { ChemFormula } from "@/lib/ui/chem-formula";

afterEach(cleanup);

const html = (formula: string) =>
  render(<ChemFormula formula={formula} />).container.querySelector("[aria-hidden]")!.innerHTML;

describe("ChemFormula", () => {
  it.each([
    ["NO3-", "NO<sub>3</sub><sup>−</sup>"],
    ["SO4^2-", "SO<sub>4</sub><sup>2−</sup>"],
    ["Fe(CN)6^3-", "Fe(CN)<sub>6</sub><sup>3−</sup>"],
    ["Na+", "Na<sup>+</sup>"],
    ["CuSO4·5H2O", "CuSO<sub>4</sub>·5H<sub>2</sub>O"],
    ["Hg2^2+", "Hg<sub>2</sub><sup>2+</sup>"],
  ])("writes %s with sub- and superscripts", (formula, expected) => {
    expect(html(formula)).toBe(expected);
  });

  it("gives screen readers the plain formula and hides the typeset copy from them", () => {
    const { container } = render(<ChemFormula formula="SO4^2-" />);
    expect(container.querySelector(".sr-only")?.textContent).toBe("SO4^2-");
    expect(container.querySelector("[aria-hidden]")?.textContent).toBe("SO42−");
  });
});
