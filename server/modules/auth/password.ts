import { hash, verify, type Algorithm, type Options } from '@node-rs/argon2';

/**
 * argon2id with m = 19 MiB, t = 2, p = 1: the minimum configuration recommended by the OWASP Password
 * Storage Cheat Sheet (argon2id section). `Algorithm` is an ambient const enum, so the value is written
 * out: 2 = Argon2id in @node-rs/argon2.
 */
export const ARGON2_OPTIONS: Options = {
  algorithm: 2 as Algorithm,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
};

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

let dummyHash: Promise<string> | undefined;
/** Verifies against a throwaway hash so an unknown e-mail takes as long as a wrong password. */
export async function spendVerifyTime(password: string): Promise<void> {
  dummyHash ??= hashPassword('not-a-real-password-0000');
  await verifyPassword(await dummyHash, password);
}
