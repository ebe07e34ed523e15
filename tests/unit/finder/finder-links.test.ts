import { describe, expect, it } from "vitest";
import { finderExportHref, finderHref } from "@/app/(app)/solutions/results-table";

describe("the finder's links", () => {
  it("exports the search in the table's sort and direction, every page", () => {
    const query = { iMin: "0.09", species: "NaCl", sort: "ionicStrength", dir: "desc", page: "3" };
    expect(finderExportHref(query)).toBe(
      "/api/solutions/export?iMin=0.09&species=NaCl&sort=ionicStrength&dir=desc",
    );
    expect(finderExportHref({})).toBe("/api/solutions/export");
  });

  it("carries a sort chosen at a column header into the export", () => {
    const header = finderHref({ species: "KCl", page: "2" }, { sort: "temperature", dir: "asc" });
    const query = Object.fromEntries(new URL(header, "http://x").searchParams);
    expect(finderExportHref(query)).toBe(
      "/api/solutions/export?species=KCl&sort=temperature&dir=asc",
    );
  });
});
