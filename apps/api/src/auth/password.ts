import { hash, verify } from "@node-rs/argon2";

// argon2id (the library's default algorithm) with the OWASP minimum: 19 MiB, 2 passes, 1 lane.
const options = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

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

let dummyHash: Promise<string> | null = null;
/** Verifies against a throwaway hash so an unknown e-mail costs as much time as a wrong password. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword("not-a-real-password-0");
  await verifyPassword(await dummyHash, password);
}
