import { hash, verify } from "@node-rs/argon2";

// argon2id (algorithm 2) with the OWASP-recommended minimum: 19 MiB, 2 passes, 1 lane.
const options = { algorithm: 2, memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, options);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}
