/**
 * lib/signing — PDF signatures for issued reports: a PKCS#7 (adbe.pkcs7.detached) signature added with
 * @signpdf from a PKCS#12 identity, and an independent check (ByteRange → SHA-256 → node-forge PKCS#7
 * messageDigest and RSA signature). Server-only (Node crypto and Buffers); no React, Next or db imports.
 */
export { fingerprintOf, readSigningIdentity, summarizeCertificate, type CertificateSummary, type SigningIdentity } from "./certificate";
export { createSelfSignedP12, type SelfSignedOptions } from "./self-signed";
export { SIGNATURE_LENGTH, signPdf, type SignatureDetails } from "./sign";
export { readSignedRange, type SignedRange } from "./byte-range";
export { checkPdfSignature, sha256Hex, type SignatureCheck } from "./verify-signature";
