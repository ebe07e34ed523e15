// @vitest-environment node
import { describe, expect, it } from "vitest";
import { entryDocumentSchema, describeDocumentErrors } from "@/lib/document/document-schema";
import { entryTemplates } from "@/lib/document/templates";
import { extractCellBlocks, extractSolutionBlocks } from "@/lib/document/extract-blocks";
import { isSafeHref } from "@/lib/document/safe-href";

const para = (text: string, marks?: unknown[]) => ({
  type: "paragraph",
  content: [{ type: "text", text, ...(marks ? { marks } : {}) }],
});
const doc = (...content: unknown[]) => ({ type: "doc", content });

describe("entryDocumentSchema", () => {
  it.each(entryTemplates.map((t) => [t.id, t] as const))(
    "accepts the %s template",
    (_id, template) => {
      const result = entryDocumentSchema.safeParse(template.build());
      expect(result.success ? [] : describeDocumentErrors(result.error)).toEqual([]);
    },
  );

  it("accepts tables, task lists, math and safe links", () => {
    const result = entryDocumentSchema.safeParse(
      doc(
        para("see", [
          {
            type: "link",
            attrs: { href: "https://example.org/sds" },
          },
        ]),
        { type: "blockMath", attrs: { latex: "I = \\tfrac12 \\sum_i m_i z_i^2" } },
        {
          type: "table",
          content: [
            {
              type: "tableRow",
              content: [
                {
                  type: "tableHeader",
                  attrs: { colspan: 1, rowspan: 1, colwidth: null },
                  content: [para("E / V")],
                },
              ],
            },
          ],
        },
        {
          type: "taskList",
          content: [{ type: "taskItem", attrs: { checked: true }, content: [para("purged")] }],
        },
      ),
    );
    expect(result.success).toBe(true);
  });

  it("rejects an unknown node type", () => {
    expect(
      entryDocumentSchema.safeParse(doc({ type: "iframe", attrs: { src: "https://x" } })).success,
    ).toBe(false);
  });

  it.each([
    "javascript:alert(1)",
    "JaVaScRiPt:alert(1)",
    "java\tscript:alert(1)",
    " data:text/html,<script>alert(1)</script>",
    "vbscript:x",
  ])("rejects the link %j", (href) => {
    const result = entryDocumentSchema.safeParse(
      doc(para("x", [{ type: "link", attrs: { href } }])),
    );
    expect(result.success).toBe(false);
  });

  it.each([
    { class: "fixed inset-0 z-50 opacity-0" },
    { target: "_self" },
    { rel: "opener" },
    { title: "x" },
    { style: "position:fixed;inset:0" },
  ])("keeps only a link's href: refuses %j beside it", (extra) => {
    const result = entryDocumentSchema.safeParse(
      doc(para("x", [{ type: "link", attrs: { href: "https://example.org", ...extra } }])),
    );
    expect(result.success).toBe(false);
  });

  it("rejects protocol-relative and backslash link forms that leave the app", () => {
    for (const href of ["//evil.example/x", "/\\evil.example", "\\\\evil.example"]) {
      const result = entryDocumentSchema.safeParse(
        doc(para("x", [{ type: "link", attrs: { href } }])),
      );
      expect(result.success, href).toBe(false);
    }
  });

  it("rejects unknown marks and attributes smuggled onto plain nodes", () => {
    expect(entryDocumentSchema.safeParse(doc(para("x", [{ type: "script" }]))).success).toBe(false);
    expect(
      entryDocumentSchema.safeParse(doc({ type: "paragraph", attrs: { onclick: "alert(1)" } }))
        .success,
    ).toBe(false);
  });

  it("rejects out-of-range and malformed block attributes", () => {
    const [template] = entryTemplates;
    const good = template.build() as {
      content: { type: string; attrs?: Record<string, unknown> }[];
    };
    const withSolution = (patch: Record<string, unknown>) => ({
      ...good,
      content: good.content.map((node) =>
        node.type === "solutionBlock" ? { ...node, attrs: { ...node.attrs, ...patch } } : node,
      ),
    });
    expect(entryDocumentSchema.safeParse(withSolution({ temperatureC: 5000 })).success).toBe(false);
    expect(entryDocumentSchema.safeParse(withSolution({ model: "made-up" })).success).toBe(false);
    expect(
      entryDocumentSchema.safeParse(
        withSolution({
          components: Array.from({ length: 41 }, () => ({
            formula: "NaCl",
            amount: 1,
            unit: "mol/kg",
          })),
        }),
      ).success,
    ).toBe(false);
    expect(
      entryDocumentSchema.safeParse(withSolution({ computedIonicStrength: 0.1 })).success,
    ).toBe(false);
    expect(entryDocumentSchema.safeParse(withSolution({ blockId: "<script>" })).success).toBe(
      false,
    );
  });

  it("still accepts chemically impossible but well-formed inputs, so the entry keeps saving", () => {
    const [template] = entryTemplates;
    const built = template.build() as {
      content: { type: string; attrs?: Record<string, unknown> }[];
    };
    const solution = built.content.find((n) => n.type === "solutionBlock")!;
    solution.attrs = {
      ...solution.attrs,
      components: [{ formula: "NaCl", amount: -1, unit: "mol/kg" }],
    };
    expect(entryDocumentSchema.safeParse(built).success).toBe(true);
  });

  it("rejects two blocks with one id", () => {
    const built = entryTemplates[0].build() as { content: { type: string }[] };
    const solution = built.content.find((n) => n.type === "solutionBlock")!;
    expect(
      entryDocumentSchema.safeParse({ ...built, content: [...built.content, solution] }).success,
    ).toBe(false);
  });
});

describe("entryDocumentSchema size limits", () => {
  it("refuses a document nested deeper than any entry needs", () => {
    let node: unknown = para("deep");
    for (let i = 0; i < 50; i++) node = { type: "blockquote", content: [node] };
    expect(entryDocumentSchema.safeParse(doc(node)).success).toBe(false);
  });

  it("refuses a document with more nodes than the limit, and accepts a long ordinary one", () => {
    const rows = (n: number) => Array.from({ length: n }, (_, i) => para(`line ${i}`));
    expect(entryDocumentSchema.safeParse(doc(...rows(2000))).success).toBe(true);
    const huge = {
      type: "doc",
      content: Array.from({ length: 50 }, () => ({
        type: "bulletList",
        content: Array.from({ length: 150 }, () => ({ type: "listItem", content: [para("x")] })),
      })),
    };
    expect(entryDocumentSchema.safeParse(huge).success).toBe(false);
  });
});

describe("isSafeHref", () => {
  it("allows web, mail and in-app links", () => {
    expect(
      ["https://a.org", "http://a.org", "mailto:pi@lab.org", "/entries/4", "#results"].every(
        isSafeHref,
      ),
    ).toBe(true);
  });
});

describe("extract blocks", () => {
  it("returns the inputs of each block in document order", () => {
    const built = entryTemplates[0].build();
    const solutions = extractSolutionBlocks(built);
    const cells = extractCellBlocks(built);
    expect(solutions.map((s) => s.name)).toEqual(["Supporting electrolyte A"]);
    expect(cells).toHaveLength(1);
    expect(cells[0].electrolyteBlockId).toBe(solutions[0].blockId);
    const nested = doc({
      type: "blockquote",
      content: [{ type: "solutionBlock", attrs: solutions[0] }],
    });
    expect(extractSolutionBlocks(nested)).toHaveLength(1);
  });
});
