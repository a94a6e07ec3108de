import "server-only";
import fs from "node:fs";
import { AppError } from "@/lib/api/errors";
import { serverEnv } from "@/lib/env";
import { readSigningIdentity, type SigningIdentity } from "./certificate";

let cached: { path: string; identity: SigningIdentity } | undefined;

/**
 * The firm's signing identity from SIGNING_P12_PATH / SIGNING_P12_PASSWORD (npm start and npm test set
 * them to the development certificate). Throws a 400-class AppError with a clear message when missing.
 */
export function configuredSigningIdentity(): SigningIdentity {
  const env = serverEnv();
  const path = env.SIGNING_P12_PATH;
  if (!path) throw new AppError("bad_request", "No signing certificate is configured (SIGNING_P12_PATH). Reports cannot be issued until the owner sets one.");
  if (cached?.path === path) return cached.identity;
  let bytes: Buffer;
  try {
    bytes = fs.readFileSync(path);
  } catch {
    throw new AppError("bad_request", `The signing certificate file (SIGNING_P12_PATH) cannot be read.`);
  }
  const identity = readSigningIdentity(bytes, env.SIGNING_P12_PASSWORD ?? "");
  cached = { path, identity };
  return identity;
}
