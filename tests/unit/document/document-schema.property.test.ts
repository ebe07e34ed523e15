// @vitest-environment node
/**
 * Property tests of the document boundary (fast-check, fixed seed): whatever JSON arrives,
 * parsing answers "accepted" or "refused with problems", never throws, and a refused document
 * never reaches the revision writer. Self-consistency checks: no outside value exists here.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { safeParseEntryDocument } from "@/lib/document/document-schema";
import { prepareRevision } from "@/lib/document/prepare-revision";
import { isAppError } from "@/lib/errors";

const SEED = 20261202;
const RUNS = 300;

/** Documents built from the node types the editor writes, nested a few levels. */
const textNode = fc.record({ type: fc.constant("text"), text: fc.string({ minLength: 1 }) });
const paragraph = fc.record({
  type: fc.constant("paragraph"),
  content: fc.array(textNode, { maxLength: 4 }),
});
const listItem = fc.record({
  type: fc.constant("listItem"),
  content: fc.array(paragraph, { minLength: 1, maxLength: 2 }),
});
const bulletList = fc.record({
  type: fc.constant("bulletList"),
  content: fc.array(listItem, { minLength: 1, maxLength: 3 }),
});
const wellFormed = fc.record({
  type: fc.constant("doc"),
  content: fc.array(fc.oneof(paragraph, bulletList), { maxLength: 6 }),
});

/** The same JSON with every object's keys in reverse order. */
function reverseKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(reverseKeys);
  if (value === null || typeof value !== "object") return value;
  const entries = Object.entries(value).reverse();
  return Object.fromEntries(entries.map(([k, v]) => [k, reverseKeys(v)]));
}

function nested(depth: number): unknown {
  let node: unknown = { type: "paragraph" };
  for (let i = 0; i < depth; i++) node = { type: "blockquote", content: [node] };
  return { type: "doc", content: [node] };
}

describe("document boundary (property-based)", () => {
  it("never throws on arbitrary JSON and always explains a refusal", () => {
    let runs = 0;
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 6 }), (value) => {
        runs += 1;
        const result = safeParseEntryDocument(value);
        if (!result.success) expect(result.problems.length).toBeGreaterThan(0);
      }),
      { seed: SEED, numRuns: RUNS },
    );
    expect(runs).toBe(RUNS);
  });

  it("accepts every well-formed document and hashes it the same after a key-order shuffle", () => {
    let runs = 0;
    fc.assert(
      fc.property(wellFormed, fc.string({ minLength: 1, maxLength: 80 }), (doc, title) => {
        runs += 1;
        const first = prepareRevision(title, doc);
        const reordered = reverseKeys(doc);
        expect(prepareRevision(title, reordered).contentHash).toBe(first.contentHash);
      }),
      { seed: SEED, numRuns: 100 },
    );
    expect(runs).toBe(100);
  });

  it("refuses documents nested thousands of levels deep without overflowing the stack", () => {
    for (const depth of [41, 1_000, 20_000]) {
      const result = safeParseEntryDocument(nested(depth));
      expect(result).toEqual({
        success: false,
        problems: ["document: The document nests deeper than 40 levels."],
      });
    }
    expect(safeParseEntryDocument(nested(30)).success).toBe(true);
  });

  it("turns every refusal into invalid_input before anything is written", () => {
    let refused = 0;
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 4 }), (value) => {
        try {
          prepareRevision("t", value);
        } catch (error) {
          refused += 1;
          expect(isAppError(error) && error.code === "invalid_input").toBe(true);
        }
      }),
      { seed: SEED, numRuns: 200 },
    );
    // Arbitrary JSON is almost never a valid document: nearly every run is a refusal.
    expect(refused).toBeGreaterThan(190);
  });
});
