// The development signing certificate: a self-signed certificate and key in a PKCS#12 file under
// .data/certs/ (git-ignored), created on first run and reused afterwards. Production does not use
// this: it sets SIGNING_P12_PATH and SIGNING_P12_PASSWORD to the firm's own certificate.
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { createSelfSignedP12, readSigningIdentity } from "../../lib/signing";

export interface DevCertificate {
  p12Path: string;
  password: string;
  created: boolean;
  fingerprintSha256: string;
}

/** Creates `<root>/.data/certs/dev-signing.p12` (and its password file) when missing; returns both. */
export function ensureDevCertificate(root: string): DevCertificate {
  const dir = path.join(root, ".data", "certs");
  const p12Path = path.join(dir, "dev-signing.p12");
  const passwordPath = path.join(dir, "dev-signing.password");
  if (fs.existsSync(p12Path) && fs.existsSync(passwordPath)) {
    const password = fs.readFileSync(passwordPath, "utf8").trim();
    try {
      const identity = readSigningIdentity(fs.readFileSync(p12Path), password);
      if (identity.certificate.notAfter.getTime() > Date.now() + 24 * 3600_000) {
        return { p12Path, password, created: false, fingerprintSha256: identity.certificate.fingerprintSha256 };
      }
    } catch {
      // unreadable or mismatched: make a new one below
    }
  }
  fs.mkdirSync(dir, { recursive: true, mode: 0o700 });
  const password = randomBytes(18).toString("base64url");
  const { p12 } = createSelfSignedP12({ commonName: "Eigenroom development signer", organization: "Eigenroom development (not for clients)", password });
  fs.writeFileSync(p12Path, p12, { mode: 0o600 });
  fs.writeFileSync(passwordPath, `${password}\n`, { mode: 0o600 });
  const identity = readSigningIdentity(p12, password);
  return { p12Path, password, created: true, fingerprintSha256: identity.certificate.fingerprintSha256 };
}
