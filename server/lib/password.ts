import { hash, verify } from "@node-rs/argon2";

// argon2id at the OWASP Password Storage Cheat Sheet minimum: 19 MiB, 2 iterations, 1 lane.
const OPTIONS = { algorithm: 2 /* Algorithm.Argon2id (a const enum) */, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => hash(password, OPTIONS);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// Verifying against this when the e-mail is unknown keeps both answers equally slow.
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword("not-a-real-password-for-timing");
  return dummyHash;
}
