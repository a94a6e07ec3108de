import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { supportedExtensions } from "file-type";
import { extensionsOf, sniff, SNIFFED_PROGRAMS, SNIFFED_TYPES } from "@/lib/storage/sniff";

// Signatures: JPEG SOI FF D8 FF (ITU-T T.81 Annex B), PNG 89 50 4E 47 0D 0A 1A 0A (ISO/IEC 15948 §5.2),
// RIFF…WEBP (RFC 9649 §2.5), "%PDF-" (ISO 32000-1 §7.5.2), "MZ" DOS header (Microsoft PE/COFF
// specification §1), 7F "ELF" (System V ABI), FE ED FA CE / CF FA ED FE (Mach-O, from memory),
// "#!" interpreter line (POSIX exec). Real images are made with sharp; the rest are their first bytes.
const pad = (head: number[], size = 4096) => {
  const b = new Uint8Array(size);
  b.set(head);
  return b;
};
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));
const image = async (format: "jpeg" | "png" | "webp" | "gif") => new Uint8Array(await sharp({ create: { width: 16, height: 12, channels: 3, background: "#8a7" } })[format]().toBuffer());

describe("sniff (file-type): the accepted types by their bytes", () => {
  it("recognises real JPEG, PNG and WebP images and a PDF header", async () => {
    expect(await sniff(await image("jpeg"))).toEqual({ type: "image/jpeg" });
    expect(await sniff(await image("png"))).toEqual({ type: "image/png" });
    expect(await sniff(await image("webp"))).toEqual({ type: "image/webp" });
    expect(await sniff(new TextEncoder().encode("%PDF-1.7\n%%EOF\n"))).toEqual({ type: "application/pdf" });
  });

  it("answers nothing for plain text, HTML, SVG and an image type we do not store (GIF)", async () => {
    for (const text of ["just some notes", "<!doctype html><p>hi</p>", '<svg xmlns="http://www.w3.org/2000/svg"/>']) expect(await sniff(new TextEncoder().encode(text)), text).toEqual({});
    expect(await sniff(await image("gif"))).toEqual({});
    expect(await sniff(new Uint8Array(0))).toEqual({});
  });
});

describe("sniff (file-type): programs, whatever the name", () => {
  it("names a Windows, Linux and macOS program, a Java class, WebAssembly, an archive, an installer and a script", async () => {
    const exe = pad([0x4d, 0x5a, 0x90, 0x00]);
    exe.set([0x50, 0x45, 0x00, 0x00], 0x80);
    const cases: [Uint8Array, string][] = [
      [exe, "a Windows program"],
      [pad([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), "a Linux program"],
      [pad([0xfe, 0xed, 0xfa, 0xce]), "a macOS program"],
      [pad([0xcf, 0xfa, 0xed, 0xfe]), "a macOS program"],
      [pad([0xca, 0xfe, 0xba, 0xbe, 0, 0, 0, 0x34]), "a Java program"],
      [pad([0x00, 0x61, 0x73, 0x6d, 1, 0, 0, 0]), "a WebAssembly module"],
      [pad([0x50, 0x4b, 0x03, 0x04, 20, 0]), "a compressed archive"],
      [pad([0x1f, 0x8b, 0x08]), "a compressed archive"],
      [pad([0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1]), "an installer package"],
      [new Uint8Array(ascii("#!/bin/sh\necho hello\n")), "a script"],
    ];
    for (const [bytes, program] of cases) expect(await sniff(bytes), program).toEqual({ program });
  });

  it("a program that starts with an image's name is still a program: only the bytes count", async () => {
    expect(await sniff(pad(ascii("MZ")))).toEqual({ program: "a Windows program" });
  });

  it("every file-type answer in our tables is one file-type can give (no dead entries)", () => {
    for (const ext of [...Object.keys(SNIFFED_TYPES), ...Object.keys(SNIFFED_PROGRAMS)]) expect(supportedExtensions.has(ext as never), ext).toBe(true);
  });
});

describe("extensionsOf", () => {
  it("lists the endings last first, lower case; none for a bare name", () => {
    expect(extensionsOf("Plan.PDF.exe")).toEqual(["exe", "pdf"]);
    expect(extensionsOf("README")).toEqual([]);
  });
});
