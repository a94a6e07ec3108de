import { plainAddPlaceholder } from "@signpdf/placeholder-plain";
import { P12Signer } from "@signpdf/signer-p12";
import { SignPdf } from "@signpdf/signpdf";
import type { SigningIdentity } from "./certificate";

export interface SignatureDetails {
  /** why it is signed, shown by PDF readers */
  reason: string;
  /** the signer's name */
  name: string;
  /** the firm's contact address */
  contactInfo: string;
  location: string;
  signingTime: Date;
}

/** Room reserved for the PKCS#7 blob, bytes (doubles as hex in the file); ample for a 4096-bit chain. */
export const SIGNATURE_LENGTH = 16_384;

/**
 * Embeds a detached PKCS#7 signature (adbe.pkcs7.detached) over the PDF's byte range: adds a signature
 * placeholder to the file's trailer (an incremental update with its own xref), then signs with the
 * PKCS#12 identity. Returns the signed file; the input is not changed.
 */
export async function signPdf(pdf: Buffer, identity: SigningIdentity, details: SignatureDetails): Promise<Buffer> {
  const withPlaceholder = plainAddPlaceholder({
    pdfBuffer: pdf,
    reason: details.reason,
    contactInfo: details.contactInfo,
    name: details.name,
    location: details.location,
    signingTime: details.signingTime,
    signatureLength: SIGNATURE_LENGTH,
    appName: "Eigenroom",
  });
  const signer = new P12Signer(identity.p12, { passphrase: identity.password });
  return new SignPdf().sign(withPlaceholder, signer, details.signingTime);
}
