import { hash, verify } from "@node-rs/argon2";

// argon2id (algorithm 2) with the OWASP-recommended minimum: 19 MiB, 2 passes, 1 lane.
const OPTIONS = { algorithm: 2, memoryCost: 19_456, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => hash(password, OPTIONS);

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

// Verified against when the e-mail is unknown, so a miss costs as long as a hit.
let dummyHash: Promise<string> | null = null;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword("not-a-real-password-for-timing");
  return dummyHash;
}
