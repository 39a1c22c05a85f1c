import { hash, verify } from '@node-rs/argon2';

// Argon2id with the OWASP password-storage parameters (19 MiB, 2 passes, 1 lane).
const ARGON2ID = 2;
const OPTIONS = { algorithm: ARGON2ID, memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// A hash to verify against when no account matches, so both paths take the same time.
let decoyHash: Promise<string> | null = null;
export function decoyPasswordHash(): Promise<string> {
  decoyHash ??= hashPassword('no account has this password');
  return decoyHash;
}
