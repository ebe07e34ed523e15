import { describe, expect, it } from "vitest";
import { summariseChange } from "@/lib/document/revision-diff";

const p = (text: string) => ({ type: "paragraph", content: [{ type: "text", text }] });
const block = (blockId: string, name: string, amount: number) => ({
  type: "solutionBlock",
  attrs: { blockId, name, components: [{ formula: "KCl", amount }] },
});
const doc = (...content: unknown[]) => ({ type: "doc", content });

describe("what changed between revisions", () => {
  it("names the first version", () => {
    expect(summariseChange(null, { title: "A", content: doc(p("x")) })).toEqual([
      "First saved version",
    ]);
  });

  it("counts words added and removed and reports the title", () => {
    const changes = summariseChange(
      { title: "Run 1", content: doc(p("polished the disc")) },
      { title: "Run 1b", content: doc(p("polished the gold disc twice")) },
    );
    expect(changes).toEqual(["Title changed to “Run 1b”", "Text: +2 words"]);
  });

  it("follows blocks by their stable id", () => {
    const before = {
      title: "T",
      content: doc(block("blk-a", "Stock", 0.1), block("blk-b", "Rinse", 0.01)),
    };
    const after = {
      title: "T",
      content: doc(block("blk-a", "Stock", 0.2), block("blk-c", "New", 1)),
    };
    expect(summariseChange(before, after)).toEqual([
      "Text: +1 / −1 words",
      "Solution block “Stock” changed",
      "Solution block “New” added",
      "Solution block “Rinse” removed",
    ]);
  });
});
