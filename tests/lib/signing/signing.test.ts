// Signing and the independent check: a PDF signed with @signpdf is checked by our own ByteRange +
// node-forge PKCS#7 code (RFC 5652 §5.4: messageDigest over the covered bytes, RSA over the signed
// attributes), and by poppler's pdfsig as an outside reference. One changed byte must fail.
import { execFileSync } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Document, Page, Text, renderToBuffer } from "@react-pdf/renderer";
import { createElement } from "react";
import { beforeAll, describe, expect, it } from "vitest";
import { checkPdfSignature, createSelfSignedP12, readSignedRange, readSigningIdentity, sha256Hex, signPdf, type SigningIdentity } from "@/lib/signing";

let identity: SigningIdentity;
let plain: Buffer;
let signed: Buffer;
const signingTime = new Date("2026-12-01T19:30:00Z");

beforeAll(async () => {
  const { p12 } = createSelfSignedP12({ commonName: "Test signer", organization: "Invented Test Firm", password: "pw-test" });
  identity = readSigningIdentity(p12, "pw-test");
  plain = await renderToBuffer(createElement(Document, null, createElement(Page, { size: "A4" }, createElement(Text, null, "ER-2026-0001 test page"))));
  signed = await signPdf(plain, identity, { reason: "test", name: "Test signer", contactInfo: "test@invented.example", location: "Test", signingTime });
}, 60_000);

describe("readSigningIdentity", () => {
  it("reads the certificate's name and a 32-byte SHA-256 fingerprint", () => {
    expect(identity.certificate.commonName).toBe("Test signer");
    expect(identity.certificate.organization).toBe("Invented Test Firm");
    expect(identity.certificate.fingerprintSha256).toMatch(/^([0-9A-F]{2}:){31}[0-9A-F]{2}$/);
    expect(identity.certificate.selfSigned).toBe(true);
  });
  it("throws a TypeError naming the file for a wrong password", () => {
    expect(() => readSigningIdentity(identity.p12, "wrong")).toThrow(/PKCS#12/);
  });
});

describe("signPdf + checkPdfSignature", () => {
  it("an unsigned PDF is 'unsigned'", () => {
    expect(checkPdfSignature(plain)).toEqual({ status: "unsigned" });
  });

  it("a freshly signed PDF is intact, by the signer, at the signing time", () => {
    const c = checkPdfSignature(signed);
    expect(c.status).toBe("intact");
    if (c.status !== "intact") return;
    expect(c.signer.fingerprintSha256).toBe(identity.certificate.fingerprintSha256);
    expect(c.signingTime?.toISOString()).toBe(signingTime.toISOString());
  });

  it("the covered hash is the SHA-256 of the two ByteRange slices, computed here by hand", () => {
    const text = signed.toString("latin1");
    const m = [...text.matchAll(/\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/g)].at(-1)!;
    const [a, b, c, d] = [1, 2, 3, 4].map((i) => Number(m[i]));
    const hand = createHash("sha256").update(signed.subarray(a!, a! + b!)).update(signed.subarray(c!, c! + d!)).digest("hex");
    const check = checkPdfSignature(signed);
    expect(check.status === "intact" && check.coveredSha256).toBe(hand);
    expect(c! + d!).toBe(signed.length);
    expect(readSignedRange(signed)?.byteRange).toEqual([a, b, c, d]);
  });

  it("one changed byte in the covered content → tampered", () => {
    const range = readSignedRange(signed)!;
    for (const at of [20, Math.floor(range.byteRange[1] / 2), range.byteRange[2] + 5]) {
      const bad = Buffer.from(signed);
      bad[at] = bad[at]! ^ 0x01;
      expect(checkPdfSignature(bad).status, `byte ${at}`).toBe("tampered");
    }
  });

  it("one changed byte inside the signature blob → tampered", () => {
    const range = readSignedRange(signed)!;
    const bad = Buffer.from(signed);
    // The RSA signature value closes the DER blob (SignerInfo.encryptedDigest): change one hex digit of it.
    const at = range.byteRange[1] + 1 + 2 * (range.signatureDer.length - 10);
    bad[at] = bad[at] === 0x41 ? 0x42 : 0x41;
    expect(checkPdfSignature(bad).status).toBe("tampered");
  });

  it("bytes appended after signing → tampered (the byte range no longer ends the file)", () => {
    expect(checkPdfSignature(Buffer.concat([signed, Buffer.from("\n%extra\n")])).status).toBe("tampered");
  });

  it("sha256Hex is the SHA-256 of the whole file", () => {
    expect(sha256Hex(signed)).toBe(createHash("sha256").update(signed).digest("hex"));
  });

  it("poppler's pdfsig reports the signature valid (outside reference)", () => {
    let out = "";
    try {
      execFileSync("which", ["pdfsig"]);
    } catch {
      throw new Error("pdfsig (poppler-utils) is missing; npm test installs it");
    }
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "er-sig-")), "signed.pdf");
    fs.writeFileSync(file, signed);
    try {
      out = execFileSync("pdfsig", [file], { encoding: "utf8" });
    } catch (e) {
      out = String((e as { stdout?: string }).stdout ?? "");
    }
    expect(out).toMatch(/Signature is Valid/);
    expect(out).toMatch(/Test signer/);
    const bad = Buffer.from(signed);
    bad[30] = bad[30]! ^ 1;
    fs.writeFileSync(file, bad);
    try {
      out = execFileSync("pdfsig", [file], { encoding: "utf8" });
    } catch (e) {
      out = String((e as { stdout?: string }).stdout ?? "");
    }
    expect(out).not.toMatch(/Signature is Valid/);
  });
});
