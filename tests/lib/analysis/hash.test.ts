// sha256Hex against node:crypto (a general-purpose reference implementation) and the FIPS 180-4
// example "abc"; canonicalJson's key-order independence.
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { canonicalJson, sha256Hex } from "@/lib/analysis";

describe("sha256Hex", () => {
  it("gives the FIPS 180-4 digest of 'abc'", () => {
    expect(sha256Hex("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("equals node:crypto for the empty string, block boundaries, UTF-8 and long text", () => {
    const inputs = ["", "a", "x".repeat(55), "x".repeat(56), "x".repeat(63), "x".repeat(64), "x".repeat(65), "Schroeder — α ≥ 0.5 · 63 Hz 🎧", "y".repeat(100_003)];
    for (const s of inputs) expect(sha256Hex(s)).toBe(createHash("sha256").update(s, "utf8").digest("hex"));
  });
});

describe("canonicalJson", () => {
  it("sorts keys at every level and leaves undefined members out", () => {
    expect(canonicalJson({ b: 1, a: [2, { d: 3, c: 4 }], u: undefined })).toBe('{"a":[2,{"c":4,"d":3}],"b":1}');
    expect(canonicalJson({ x: { q: 1, p: 2 } })).toBe(canonicalJson({ x: { p: 2, q: 1 } }));
  });

  it("refuses non-finite numbers", () => {
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(RangeError);
    expect(() => canonicalJson([Number.POSITIVE_INFINITY])).toThrow(RangeError);
  });
});
