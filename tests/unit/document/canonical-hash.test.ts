// @vitest-environment node
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalHash, canonicalJson, sha256Hex } from "@/lib/document/canonical-hash";

describe("sha256Hex", () => {
  it("matches the FIPS 180-4 example digests", () => {
    // NIST FIPS 180-4 examples (SHA256.pdf, "one-block" and "two-block" messages) and the
    // well-known digest of the empty string.
    expect(sha256Hex("abc")).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
    expect(sha256Hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq")).toBe(
      "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1",
    );
    expect(sha256Hex("")).toBe("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    // NIST's long-message vector: one million repetitions of "a".
    expect(sha256Hex("a".repeat(1_000_000))).toBe(
      "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0",
    );
  });

  it("agrees with Node's crypto on block-boundary lengths and non-ASCII text", () => {
    for (const length of [55, 56, 63, 64, 65, 119, 120, 1000]) {
      const input = "µ°γ±".repeat(length).slice(0, length);
      expect(sha256Hex(input)).toBe(createHash("sha256").update(input, "utf8").digest("hex"));
    }
  });
});

describe("canonicalHash", () => {
  const a = {
    type: "doc",
    content: [{ type: "paragraph", attrs: { b: 1, a: [2, { y: 1, x: 0 }] } }],
  };
  const b = {
    content: [{ attrs: { a: [2, { x: 0, y: 1 }], b: 1 }, type: "paragraph" }],
    type: "doc",
  };

  it("is stable under key order", () => {
    expect(canonicalJson(a)).toBe(canonicalJson(b));
    expect(canonicalHash(a)).toBe(canonicalHash(b));
    expect(canonicalHash(a)).toMatch(/^[0-9a-f]{64}$/);
  });

  it("sorts keys and drops undefined, like JSON without whitespace", () => {
    expect(canonicalJson({ z: 1, a: undefined, m: [undefined, "q"] })).toBe(
      '{"m":[null,"q"],"z":1}',
    );
  });

  it("changes when content changes, including array order", () => {
    expect(canonicalHash({ n: [1, 2] })).not.toBe(canonicalHash({ n: [2, 1] }));
    expect(canonicalHash({ t: "0.1" })).not.toBe(canonicalHash({ t: "0.10" }));
  });

  it("refuses values JSON cannot carry", () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(TypeError);
    const cyclic: Record<string, unknown> = {};
    cyclic.self = cyclic;
    expect(() => canonicalJson(cyclic)).toThrow(/cycle/);
  });
});
