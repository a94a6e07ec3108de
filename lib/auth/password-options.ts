import type { Options } from "@node-rs/argon2";

/** argon2id with the OWASP Password Storage Cheat Sheet's first suggested setting (m = 19 MiB, t = 2, p = 1). */
export const ARGON2_OPTIONS: Options = { algorithm: 2 /* Argon2id */, memoryCost: 19_456, timeCost: 2, parallelism: 1 };
