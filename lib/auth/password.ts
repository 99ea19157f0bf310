import { hash, verify } from "@node-rs/argon2";

/**
 * argon2id with the OWASP Password Storage Cheat Sheet's minimum parameters:
 * 19 MiB memory, 2 iterations, parallelism 1.
 */
export const ARGON2_OPTIONS = {
  algorithm: 2, // Algorithm.Argon2id (const enum, inlined so isolatedModules is happy)
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
  outputLen: 32,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, ARGON2_OPTIONS);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}
