import { hash, verify } from "@node-rs/argon2";

// Argon2id (the library's default algorithm) with OWASP's minimum for 19 MiB of memory.
const options = { memoryCost: 19_456, timeCost: 2, outputLen: 32, parallelism: 1 } as const;

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

// Hashing a throw-away password for unknown e-mails keeps both kinds of failed sign-in equally slow,
// so the timing does not tell whether an account exists.
let decoy: Promise<string> | undefined;
export async function spendPasswordTime(password: string): Promise<void> {
  decoy ??= hashPassword("understudy-decoy-password");
  await verifyPassword(await decoy, password);
}
