import argon2 from "argon2";

// argon2id at OWASP's minimum for argon2id (Password Storage Cheat Sheet: m=19 MiB, t=2, p=1).
// The parameters are stored inside each hash, so raising them later only affects new hashes;
// needsRehash() lets sign-in upgrade old ones.
export const PASSWORD_HASH_OPTIONS = { type: argon2.argon2id, memoryCost: 19456, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, PASSWORD_HASH_OPTIONS);
}

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false; // a malformed stored hash never signs anyone in
  }
}

export function passwordNeedsRehash(hash: string): boolean {
  return argon2.needsRehash(hash, PASSWORD_HASH_OPTIONS);
}

// Verifying against a fixed hash when the e-mail is unknown keeps the response time the same,
// so timing does not reveal which addresses have accounts.
let decoyHash: Promise<string> | undefined;
export async function verifyAgainstDecoy(password: string): Promise<false> {
  decoyHash ??= hashPassword("decoy password that no account uses");
  await verifyPassword(await decoyHash, password);
  return false;
}
