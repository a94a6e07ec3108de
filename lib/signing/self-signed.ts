import forge from "node-forge";

export interface SelfSignedOptions {
  commonName: string;
  organization: string;
  password: string;
  /** validity in years from now; default 3 */
  validYears?: number;
  /** RSA key size in bits; default 2048 */
  keyBits?: number;
}

/**
 * Creates a self-signed RSA certificate with a document-signing key usage and packs it with its key
 * into a PKCS#12 bundle (3DES, as most PDF tools expect). For development and tests only: a
 * production firm signs with a certificate from its own provider (SIGNING_P12_PATH).
 * @example createSelfSignedP12({ commonName: "Test signer", organization: "Test", password: "x" }).p12.length // ≈ 2.5 kB
 */
export function createSelfSignedP12(options: SelfSignedOptions): { p12: Buffer; certificatePem: string } {
  const { commonName, organization, password } = options;
  if (!commonName.trim()) throw new RangeError("commonName must not be empty");
  const keys = forge.pki.rsa.generateKeyPair({ bits: options.keyBits ?? 2048, e: 0x10001 });
  const cert = forge.pki.createCertificate();
  cert.publicKey = keys.publicKey;
  cert.serialNumber = `01${forge.util.bytesToHex(forge.random.getBytesSync(15))}`;
  const now = new Date();
  cert.validity.notBefore = new Date(now.getTime() - 60_000);
  cert.validity.notAfter = new Date(now);
  cert.validity.notAfter.setFullYear(now.getFullYear() + (options.validYears ?? 3));
  const names = [
    { name: "commonName", value: commonName },
    { name: "organizationName", value: organization },
  ];
  cert.setSubject(names);
  cert.setIssuer(names);
  cert.setExtensions([
    { name: "basicConstraints", cA: false },
    { name: "keyUsage", digitalSignature: true, nonRepudiation: true },
    { name: "subjectKeyIdentifier" },
  ]);
  cert.sign(keys.privateKey, forge.md.sha256.create());
  const asn1 = forge.pkcs12.toPkcs12Asn1(keys.privateKey, [cert], password, { algorithm: "3des", friendlyName: commonName });
  return { p12: Buffer.from(forge.asn1.toDer(asn1).getBytes(), "binary"), certificatePem: forge.pki.certificateToPem(cert) };
}
