import forge from "node-forge";

/** What a report shows and stores about the certificate that signed it. */
export interface CertificateSummary {
  /** subject common name, e.g. "Larchmere Room Acoustics (development)" */
  commonName: string;
  /** subject organisation, when present */
  organization: string | null;
  /** SHA-256 of the DER certificate, upper-case hex pairs joined by ':' */
  fingerprintSha256: string;
  notBefore: Date;
  notAfter: Date;
  /** true when subject and issuer are the same (a self-signed development certificate) */
  selfSigned: boolean;
}

/** A signing identity read from a PKCS#12 file: what the signer needs and what the report shows. */
export interface SigningIdentity {
  p12: Buffer;
  password: string;
  certificate: CertificateSummary;
}

const attr = (cert: forge.pki.Certificate, where: "subject" | "issuer", shortName: string): string | null => {
  const field = cert[where].getField(shortName) as { value?: unknown } | null;
  return typeof field?.value === "string" ? field.value : null;
};

/**
 * The SHA-256 fingerprint of a certificate in the usual colon form.
 * @example fingerprintOf(cert) // "3F:0A:…" (32 pairs)
 */
export function fingerprintOf(cert: forge.pki.Certificate): string {
  const der = forge.asn1.toDer(forge.pki.certificateToAsn1(cert)).getBytes();
  const hex = forge.md.sha256.create().update(der).digest().toHex().toUpperCase();
  return hex.match(/../g)!.join(":");
}

/** A readable summary of a certificate (subject, fingerprint, validity). */
export function summarizeCertificate(cert: forge.pki.Certificate): CertificateSummary {
  const subject = cert.subject.attributes.map((a) => `${a.shortName}=${String(a.value)}`).join(",");
  const issuer = cert.issuer.attributes.map((a) => `${a.shortName}=${String(a.value)}`).join(",");
  return {
    commonName: attr(cert, "subject", "CN") ?? "(no common name)",
    organization: attr(cert, "subject", "O"),
    fingerprintSha256: fingerprintOf(cert),
    notBefore: cert.validity.notBefore,
    notAfter: cert.validity.notAfter,
    selfSigned: subject === issuer,
  };
}

/**
 * Opens a PKCS#12 bundle and returns its first certificate with a private key. Throws a TypeError
 * naming the problem when the password is wrong or the bundle holds no key and certificate.
 */
export function readSigningIdentity(p12: Buffer, password: string): SigningIdentity {
  let bundle: forge.pkcs12.Pkcs12Pfx;
  try {
    bundle = forge.pkcs12.pkcs12FromAsn1(forge.asn1.fromDer(forge.util.createBuffer(p12.toString("binary"))), false, password);
  } catch (error) {
    throw new TypeError(`signing certificate: cannot open the PKCS#12 file (wrong password or not a .p12): ${(error as Error).message}`);
  }
  const certBags = bundle.getBags({ bagType: forge.pki.oids.certBag! })[forge.pki.oids.certBag!] ?? [];
  const keyBags = bundle.getBags({ bagType: forge.pki.oids.pkcs8ShroudedKeyBag! })[forge.pki.oids.pkcs8ShroudedKeyBag!] ?? [];
  const cert = certBags.find((b) => b.cert)?.cert;
  if (!cert || !keyBags.some((b) => b.key)) throw new TypeError("signing certificate: the PKCS#12 file needs a certificate and its private key");
  return { p12, password, certificate: summarizeCertificate(cert) };
}
