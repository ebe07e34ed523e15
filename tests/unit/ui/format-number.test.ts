import { describe, expect, it } from "vitest";
import { formatSignificant, parseShownNumber } from "@/lib/ui/format-number";

describe("shown numbers read back", () => {
  it("parses what formatSignificant prints, in both notations", () => {
    for (const value of [0.1, 0.7769, -0.2, 12345, 2.217e-4, -1.304e-7, 6.02e23]) {
      const shown = formatSignificant(value, 4);
      expect(Math.abs(parseShownNumber(shown)! - value) / Math.abs(value)).toBeLessThan(5e-4);
    }
    expect(parseShownNumber("—")).toBeNull();
  });
});
