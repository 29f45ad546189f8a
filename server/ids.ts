import { createHash, randomBytes } from "node:crypto";

/** 16 URL-safe characters, 96 random bits: ids that cannot be guessed or enumerated. */
export const newId = (): string => randomBytes(12).toString("base64url");

/** A single-use secret for an e-mail link (256 bits) and the hash kept in the database. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}
export const hashToken = (token: string): string => createHash("sha256").update(token).digest("hex");
