/** A signature dictionary found in a PDF: the byte range it covers and the signature's bytes. */
export interface SignedRange {
  /** [offset1, length1, offset2, length2] as written in /ByteRange */
  byteRange: [number, number, number, number];
  /** the DER bytes of the PKCS#7 blob (trailing zero padding removed) */
  signatureDer: Buffer;
  /** the two covered slices joined: everything but the /Contents hex string */
  signedBytes: Buffer;
}

const BYTE_RANGE = /\/ByteRange\s*\[\s*(\d+)\s+(\d+)\s+(\d+)\s+(\d+)\s*\]/g;

/**
 * Finds the last /ByteRange of a PDF and checks that it is well formed: it starts at 0, its gap is
 * exactly one hex string `<…>` (the /Contents), and it ends at the end of the file. Returns undefined
 * when the file has no signature; throws a RangeError when the byte range is malformed (a file that
 * claims a signature but does not hold together).
 */
export function readSignedRange(pdf: Buffer): SignedRange | undefined {
  const text = pdf.toString("latin1");
  let last: RegExpExecArray | undefined;
  for (const m of text.matchAll(BYTE_RANGE)) last = m;
  if (!last) return undefined;
  const [a, b, c, d] = [1, 2, 3, 4].map((i) => Number(last![i])) as [number, number, number, number];
  if (a !== 0) throw new RangeError("ByteRange must start at byte 0");
  if (!(b > 0 && c > b && d >= 0)) throw new RangeError("ByteRange is not in order");
  if (c + d !== pdf.length) throw new RangeError(`ByteRange ends at ${c + d}, the file has ${pdf.length} bytes (bytes were added or removed)`);
  if (pdf[b] !== 0x3c || pdf[c - 1] !== 0x3e) throw new RangeError("ByteRange gap is not the /Contents hex string");
  const hex = pdf.subarray(b + 1, c - 1).toString("latin1");
  if (!/^[0-9a-fA-F]*$/.test(hex) || hex.length % 2 !== 0) throw new RangeError("/Contents is not a hex string");
  // The placeholder is zero-padded; the ASN.1 header says where the blob really ends.
  const padded = Buffer.from(hex, "hex");
  const signatureDer = padded.subarray(0, derLength(padded));
  return { byteRange: [a, b, c, d], signatureDer, signedBytes: Buffer.concat([pdf.subarray(a, a + b), pdf.subarray(c, c + d)]) };
}

/** Total length of the outermost DER element (tag, length, content). */
function derLength(buf: Buffer): number {
  if (buf.length < 2) return buf.length;
  const first = buf[1]!;
  if (first < 0x80) return Math.min(buf.length, 2 + first);
  const n = first & 0x7f;
  if (n === 0 || n > 4 || buf.length < 2 + n) return buf.length;
  let len = 0;
  for (let i = 0; i < n; i++) len = len * 256 + buf[2 + i]!;
  return Math.min(buf.length, 2 + n + len);
}
