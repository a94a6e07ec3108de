import { db } from "@/db/client";
import { AppError } from "@/lib/api/errors";
import { errorResponse, readJson } from "@/lib/api/route";
import { MAX_VERIFY_BYTES, reportVerifySchema } from "@/lib/report/schemas";
import { verifyHash, verifyPdf, type VerifyOutcome } from "@/lib/report/verify";

/** What the public check returns: the outcome, with the facts of a valid revision. */
function body(o: VerifyOutcome) {
  if (o.status !== "valid") return o;
  const f = o.facts;
  return {
    status: o.status,
    message: o.message,
    signatureChecked: o.signatureChecked,
    report: { number: f.reportNumber, revision: f.revision, superseded: f.status === "superseded", newestRevision: f.newestRevision, room: f.roomName, project: f.projectName, firm: f.firmName, signer: f.signerName, signedAt: f.signedAt.toISOString(), sha256: f.sha256, certificateFingerprint: f.certificateFingerprint },
  };
}

/** Public: POST a PDF (multipart field `file`, or the raw bytes as application/pdf) or JSON { reportNumber, sha256 }. */
export async function POST(request: Request): Promise<Response> {
  try {
    const type = (request.headers.get("content-type") ?? "").toLowerCase();
    const declared = Number(request.headers.get("content-length") ?? "0");
    if (declared > MAX_VERIFY_BYTES + 64_000) throw new AppError("payload_too_large", `The file is larger than ${MAX_VERIFY_BYTES / 1024 / 1024} MB.`);
    let outcome: VerifyOutcome;
    if (type.includes("application/json")) {
      const input = await readJson(request, reportVerifySchema);
      outcome = await verifyHash(db, input.reportNumber, input.sha256);
    } else {
      let bytes: Buffer;
      if (type.includes("multipart/form-data")) {
        const form = await request.formData().catch(() => null);
        const file = form?.get("file");
        if (!file || typeof file === "string") throw new AppError("bad_request", "Attach the PDF as the form field `file`.", { file: ["choose a PDF file"] });
        bytes = Buffer.from(await file.arrayBuffer());
      } else if (type.includes("application/pdf")) {
        bytes = Buffer.from(await request.arrayBuffer());
      } else {
        throw new AppError("unsupported_media_type", "Send a PDF (multipart `file` or application/pdf) or JSON { reportNumber, sha256 }.");
      }
      if (bytes.length > MAX_VERIFY_BYTES) throw new AppError("payload_too_large", `The file is larger than ${MAX_VERIFY_BYTES / 1024 / 1024} MB.`);
      if (bytes.subarray(0, 5).toString("latin1") !== "%PDF-") throw new AppError("bad_request", "That file is not a PDF.", { file: ["not a PDF"] });
      outcome = await verifyPdf(db, bytes);
    }
    return Response.json(body(outcome), { status: 200 });
  } catch (error) {
    return errorResponse(error);
  }
}
