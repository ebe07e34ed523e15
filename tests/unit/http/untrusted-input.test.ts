import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isAppError } from "@/lib/errors";
import { checkUntrustedJson, checkUntrustedText } from "@/lib/validation/untrusted-input";
import { formDataToObject } from "@/lib/validation/parse";

// What PostgreSQL's text type refuses (a NUL byte) and what is not Unicode at all (a lone
// UTF-16 surrogate) are PostgreSQL's documented rules and the Unicode standard's; the limits
// are ours.

function refusal(run: () => void) {
  try {
    run();
  } catch (error) {
    if (isAppError(error)) return error;
    throw error;
  }
  return null;
}

describe("checkUntrustedJson", () => {
  it("accepts any well-formed JSON value within the limits", () => {
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 6 }), (value) => {
        // fast-check's JSON strings may hold lone surrogates and NULs; keep the clean ones.
        const text = JSON.stringify(value) ?? "";
        fc.pre(text.isWellFormed() && !text.includes("\\u0000") && !text.includes("\u0000"));
        expect(() => checkUntrustedJson(value)).not.toThrow();
      }),
      { seed: 20261202, numRuns: 300 },
    );
  });

  it("refuses a NUL byte anywhere, naming the field", () => {
    fc.assert(
      fc.property(fc.string(), fc.string(), (before, after) => {
        const error = refusal(() =>
          checkUntrustedJson({ blocks: [{ note: `${before}\u0000${after}` }] }),
        );
        expect(error?.code).toBe("invalid_input");
        expect(error?.fieldErrors).toHaveProperty(["blocks.0.note"]);
      }),
      { seed: 7, numRuns: 100 },
    );
  });

  it("refuses lone surrogates in values and in keys", () => {
    expect(refusal(() => checkUntrustedJson({ title: "Ag\uD800" }))?.message).toMatch(
      /lone surrogate/,
    );
    expect(refusal(() => checkUntrustedJson({ ["\uDC00key"]: 1 }))?.message).toMatch(
      /key is not valid Unicode/,
    );
    // A proper pair (an emoji) is fine.
    expect(() => checkUntrustedJson({ title: "pH 7 \u{1F9EA}" })).not.toThrow();
  });

  it("refuses nesting deeper than the limit without overflowing the stack", () => {
    let deep: unknown = "x";
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(refusal(() => checkUntrustedJson(deep))?.message).toMatch(/nests deeper than 128/);
  });
});

describe("checkUntrustedText and form fields", () => {
  it("refuses a NUL in a form field as a field error", () => {
    const form = new FormData();
    form.set("title", "KCl\u0000 stock");
    const error = refusal(() => formDataToObject(form));
    expect(error?.fieldErrors?.title?.[0]).toMatch(/NUL byte/);
  });

  it("refuses an over-long value and accepts ordinary text", () => {
    expect(refusal(() => checkUntrustedText({ q: "a".repeat(11) }, 10))?.message).toMatch(
      /longer than 10/,
    );
    expect(() => checkUntrustedText({ q: "Ag|AgCl, 3 M KCl — 25 °C" })).not.toThrow();
  });
});
