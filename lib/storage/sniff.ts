// Recognises a file by its bytes (its signature), never by its name, with `file-type`.
import { fileTypeFromBuffer } from "file-type";
import type { StoredContentType } from "@/db/schema";

/** What the bytes are: an accepted type, a program (how to call it), or neither. */
export interface Sniffed {
  type?: StoredContentType;
  /** "a Windows program", "a compressed archive", … — refused whatever the file is called. */
  program?: string;
}

// file-type's answers (by extension) that we store, and as what; an animated PNG is a PNG.
export const SNIFFED_TYPES: Readonly<Record<string, StoredContentType>> = {
  jpg: "image/jpeg",
  png: "image/png",
  apng: "image/png",
  webp: "image/webp",
  pdf: "application/pdf",
};

// file-type's answers that run code, install it, or can carry it unseen (archives).
export const SNIFFED_PROGRAMS: Readonly<Record<string, string>> = {
  exe: "a Windows program",
  lnk: "a Windows shortcut",
  elf: "a Linux program",
  macho: "a macOS program",
  dmg: "a macOS disk image",
  class: "a Java program",
  jar: "a Java program",
  apk: "an Android app",
  wasm: "a WebAssembly module",
  swf: "a Flash program",
  crx: "a browser extension",
  xpi: "a browser extension",
  cfb: "an installer package",
  deb: "an installer package",
  rpm: "an installer package",
  asar: "an application archive",
  ...Object.fromEntries(["zip", "tar", "rar", "gz", "bz2", "7z", "xz", "cab", "ar", "lz", "lzh", "lz4", "zst", "cpio", "arj", "tar.gz"].map((e) => [e, "a compressed archive"])),
};

/**
 * What these bytes are, by their signature (`fileTypeFromBuffer`: JPEG SOI marker, PNG signature,
 * RIFF/WEBP, %PDF- header, MZ/ELF/Mach-O executables, archives …). file-type reads binary formats
 * only; a script is recognised here by its "#!" interpreter line (POSIX exec convention).
 *
 * @example await sniff(new Uint8Array([0x4d, 0x5a, 0x90, 0x00])) // { program: "a Windows program" }
 */
export async function sniff(bytes: Uint8Array): Promise<Sniffed> {
  if (bytes.length >= 2 && bytes[0] === 0x23 && bytes[1] === 0x21) return { program: "a script" };
  const found = await fileTypeFromBuffer(bytes);
  if (!found) return {};
  const program = SNIFFED_PROGRAMS[found.ext];
  if (program) return { program };
  const type = SNIFFED_TYPES[found.ext];
  return type ? { type } : {};
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
