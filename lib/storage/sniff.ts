// Pure: recognises a file by its first bytes (its "magic number"), not by its name.
import type { StoredContentType } from "@/db/schema";

const startsWith = (bytes: Uint8Array, sig: readonly number[], offset = 0) => bytes.length >= offset + sig.length && sig.every((b, i) => bytes[offset + i] === b);
const ascii = (s: string) => [...s].map((c) => c.charCodeAt(0));

/**
 * The accepted type these bytes are, or undefined. Signatures: JPEG SOI marker FF D8 FF (ITU-T T.81
 * Annex B); PNG's eight-byte signature (ISO/IEC 15948 §5.2); WebP "RIFF" size "WEBP" (RFC 9649 §2.5);
 * PDF "%PDF-" header (ISO 32000-1 §7.5.2).
 *
 * @example sniffType(new Uint8Array([0xff, 0xd8, 0xff, 0xe0])) // "image/jpeg"
 */
export function sniffType(bytes: Uint8Array): StoredContentType | undefined {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "image/png";
  if (startsWith(bytes, ascii("RIFF")) && startsWith(bytes, ascii("WEBP"), 8)) return "image/webp";
  if (startsWith(bytes, ascii("%PDF-"))) return "application/pdf";
  return undefined;
}

const PROGRAMS: { name: string; sig: readonly number[] }[] = [
  { name: "a Windows program", sig: ascii("MZ") },
  { name: "a Linux program", sig: [0x7f, 0x45, 0x4c, 0x46] },
  { name: "a macOS program", sig: [0xfe, 0xed, 0xfa, 0xce] },
  { name: "a macOS program", sig: [0xfe, 0xed, 0xfa, 0xcf] },
  { name: "a macOS program", sig: [0xce, 0xfa, 0xed, 0xfe] },
  { name: "a macOS program", sig: [0xcf, 0xfa, 0xed, 0xfe] },
  { name: "a macOS or Java program", sig: [0xca, 0xfe, 0xba, 0xbe] },
  { name: "a script", sig: ascii("#!") },
  { name: "an installer package", sig: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1] },
  { name: "a compressed archive", sig: [0x50, 0x4b, 0x03, 0x04] },
  { name: "a WebAssembly module", sig: [0x00, 0x61, 0x73, 0x6d] },
];

/** What kind of program the bytes are ("a Windows program", …), or undefined when they are not one. */
export function sniffProgram(bytes: Uint8Array): string | undefined {
  return PROGRAMS.find((p) => startsWith(bytes, p.sig))?.name;
}

/** File-name endings that run code when opened; refused whatever the content. */
export const PROGRAM_EXTENSIONS = new Set([
  "exe", "dll", "com", "scr", "msi", "msp", "bat", "cmd", "ps1", "vbs", "vbe", "js", "jse", "wsf", "wsh", "hta", "cpl", "lnk",
  "jar", "apk", "app", "dmg", "pkg", "sh", "bash", "run", "bin", "elf", "so", "dylib", "py", "pl", "rb", "php", "html", "htm", "svg",
]);

/** The lower-case extensions of a file name, last first ("plan.pdf.exe" → ["exe", "pdf"]). */
export function extensionsOf(name: string): string[] {
  const parts = name.toLowerCase().split(".");
  return parts.length < 2 ? [] : parts.slice(1).reverse();
}
