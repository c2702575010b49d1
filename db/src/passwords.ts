import { hash, verify } from '@node-rs/argon2';

// @node-rs/argon2's Algorithm is an ambient const enum; 2 is its Argon2id member.
const ARGON2ID = 2;

/** OWASP Password Storage Cheat Sheet: argon2id, m = 19 MiB, t = 2, p = 1 (the minimum it names). */
export const argon2Options = {
  algorithm: ARGON2ID,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return hash(password, argon2Options);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}
