import "server-only";
import type { Kysely } from "kysely";
import { findIssuedByHash, findIssuedByNumber, type PublicRevisionFacts } from "@/db/queries/reports";
import type { Database } from "@/db/schema";
import { checkPdfSignature, sha256Hex } from "@/lib/signing";

/** What the public check answers. */
export type VerifyOutcome =
  | { status: "valid"; facts: PublicRevisionFacts; signatureChecked: boolean; message: string }
  | { status: "tampered"; reportNumber: string | null; message: string }
  | { status: "unknown"; message: string };

const NUMBER_IN_FILE = /ER-\d{4}-\d{4,}/;

/**
 * Checks an uploaded PDF: the whole file's SHA-256 must be that of an issued revision, and its
 * embedded signature must check out independently (ByteRange hash + node-forge PKCS#7). A file that
 * names one of our report numbers but matches no issued file, or whose signature breaks, is
 * "tampered"; anything else is "unknown".
 */
export async function verifyPdf(db: Kysely<Database>, pdf: Buffer): Promise<VerifyOutcome> {
  const sha256 = sha256Hex(pdf);
  const check = checkPdfSignature(pdf);
  const facts = await findIssuedByHash(db, sha256);
  if (facts && check.status === "intact") return { status: "valid", facts, signatureChecked: true, message: describe(facts) };
  const number = pdf.toString("latin1").match(NUMBER_IN_FILE)?.[0] ?? null;
  const known = number ? (await findIssuedByNumber(db, number)).length > 0 : false;
  if (check.status === "tampered") return { status: "tampered", reportNumber: known ? number : null, message: `The file's signature does not hold: ${check.reason}. It has been changed since it was signed.` };
  if (known) return { status: "tampered", reportNumber: number, message: `This file names report ${number}, but it is not any revision we issued: it has been changed.` };
  return { status: "unknown", message: check.status === "unsigned" ? "This file carries no signature of ours and matches no report we issued." : "This file is signed, but not as any report we issued." };
}

/** Checks a report number with a SHA-256 (hex) of the file. */
export async function verifyHash(db: Kysely<Database>, reportNumber: string, sha256: string): Promise<VerifyOutcome> {
  const revisions = await findIssuedByNumber(db, reportNumber);
  if (revisions.length === 0) return { status: "unknown", message: `We have issued no report numbered ${reportNumber.toUpperCase()}.` };
  const facts = revisions.find((r) => r.sha256 === sha256.toLowerCase());
  if (!facts) return { status: "tampered", reportNumber: revisions[0]!.reportNumber, message: `No revision of ${revisions[0]!.reportNumber} has this SHA-256: the file differs from every issued revision.` };
  return { status: "valid", facts, signatureChecked: false, message: describe(facts) };
}

function describe(f: PublicRevisionFacts): string {
  const base = `${f.reportNumber} revision ${f.revision} for ${f.roomName}, signed by ${f.signerName} of ${f.firmName} on ${f.signedAt.toISOString().slice(0, 10)}.`;
  return f.status === "superseded" ? `${base} It has since been superseded by revision ${f.newestRevision}.` : base;
}
