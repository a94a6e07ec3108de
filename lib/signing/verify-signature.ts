import { createHash } from "node:crypto";
import forge from "node-forge";
import { readSignedRange } from "./byte-range";
import { summarizeCertificate, type CertificateSummary } from "./certificate";

/** Outcome of checking the signature embedded in a PDF. */
export type SignatureCheck =
  | { status: "unsigned" }
  | { status: "tampered"; reason: string }
  | {
      status: "intact";
      /** SHA-256 of the bytes covered by the signature, hex */
      coveredSha256: string;
      signer: CertificateSummary;
      /** the signingTime attribute, when present */
      signingTime: Date | null;
    };

const OID = {
  messageDigest: "1.2.840.113549.1.9.4",
  signingTime: "1.2.840.113549.1.9.5",
  sha256: "2.16.840.1.101.3.4.2.1",
  sha384: "2.16.840.1.101.3.4.2.2",
  sha512: "2.16.840.1.101.3.4.2.3",
};

const DIGESTS: Record<string, { node: "sha256" | "sha384" | "sha512"; forge: () => forge.md.MessageDigest }> = {
  [OID.sha256]: { node: "sha256", forge: () => forge.md.sha256.create() },
  [OID.sha384]: { node: "sha384", forge: () => forge.md.sha384.create() },
  [OID.sha512]: { node: "sha512", forge: () => forge.md.sha512.create() },
};

type Asn1 = forge.asn1.Asn1;
const children = (n: Asn1): Asn1[] => (Array.isArray(n.value) ? (n.value as Asn1[]) : []);
const bytesOf = (n: Asn1): string => (typeof n.value === "string" ? n.value : "");

/** The attribute values (SET of values) of one OID among authenticated attributes. */
function attribute(attrs: Asn1[], oid: string): Asn1[] | undefined {
  for (const a of attrs) {
    const [type, values] = children(a);
    if (type && values && forge.asn1.derToOid(bytesOf(type)) === oid) return children(values);
  }
  return undefined;
}

/**
 * Checks a signed PDF independently of the signing library: reads the last /ByteRange, hashes the
 * covered bytes, opens the PKCS#7 SignedData with node-forge, compares the messageDigest attribute
 * with that hash (RFC 5652 §5.4), and verifies the RSA signature over the DER of the authenticated
 * attributes with the embedded signer certificate's public key (RFC 5652 §5.4, PKCS #1 v1.5).
 * Any mismatch → "tampered" with the reason; no signature at all → "unsigned".
 */
export function checkPdfSignature(pdf: Buffer): SignatureCheck {
  let range;
  try {
    range = readSignedRange(pdf);
  } catch (error) {
    return { status: "tampered", reason: (error as Error).message };
  }
  if (!range) return { status: "unsigned" };
  let p7: forge.pkcs7.PkcsSignedData & { rawCapture?: { signerInfos?: Asn1[] } };
  try {
    p7 = forge.pkcs7.messageFromAsn1(forge.asn1.fromDer(forge.util.createBuffer(range.signatureDer.toString("binary")))) as typeof p7;
  } catch (error) {
    return { status: "tampered", reason: `the embedded signature cannot be read: ${(error as Error).message}` };
  }
  const cert = p7.certificates?.[0];
  const signerInfo = p7.rawCapture?.signerInfos?.[0];
  if (!cert || !signerInfo) return { status: "tampered", reason: "the signature holds no signer certificate or signer information" };

  const parts = children(signerInfo);
  const algorithmSeq = parts.find((p, i) => i > 1 && p.tagClass === forge.asn1.Class.UNIVERSAL && p.type === forge.asn1.Type.SEQUENCE);
  const digestOid = algorithmSeq ? forge.asn1.derToOid(bytesOf(children(algorithmSeq)[0]!)) : "";
  const digest = DIGESTS[digestOid];
  if (!digest) return { status: "tampered", reason: `unsupported digest algorithm ${digestOid || "(none)"}` };
  const authAttrs = parts.find((p) => p.tagClass === forge.asn1.Class.CONTEXT_SPECIFIC && p.type === 0);
  const signature = parts.find((p) => p.tagClass === forge.asn1.Class.UNIVERSAL && p.type === forge.asn1.Type.OCTETSTRING);
  if (!authAttrs || !signature) return { status: "tampered", reason: "the signature has no signed attributes" };

  const covered = createHash(digest.node).update(range.signedBytes).digest();
  const claimed = attribute(children(authAttrs), OID.messageDigest)?.[0];
  if (!claimed || Buffer.from(bytesOf(claimed), "binary").compare(covered) !== 0) {
    return { status: "tampered", reason: "the document's bytes do not match the digest that was signed" };
  }
  // The signature covers the attributes re-tagged as a SET (RFC 5652 §5.4).
  const asSet = forge.asn1.create(forge.asn1.Class.UNIVERSAL, forge.asn1.Type.SET, true, children(authAttrs));
  const md = digest.forge().update(forge.asn1.toDer(asSet).getBytes());
  let ok = false;
  try {
    ok = (cert.publicKey as forge.pki.rsa.PublicKey).verify(md.digest().getBytes(), bytesOf(signature));
  } catch {
    ok = false;
  }
  if (!ok) return { status: "tampered", reason: "the signature does not verify with the signer's certificate" };

  const timeNode = attribute(children(authAttrs), OID.signingTime)?.[0];
  let signingTime: Date | null = null;
  if (timeNode) signingTime = timeNode.type === forge.asn1.Type.UTCTIME ? forge.asn1.utcTimeToDate(bytesOf(timeNode)) : forge.asn1.generalizedTimeToDate(bytesOf(timeNode));
  return { status: "intact", coveredSha256: createHash("sha256").update(range.signedBytes).digest("hex"), signer: summarizeCertificate(cert), signingTime };
}

/** SHA-256 of a whole file, lower-case hex. */
export function sha256Hex(bytes: Buffer | Uint8Array): string {
  return createHash("sha256").update(bytes).digest("hex");
}
