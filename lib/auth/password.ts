import argon2 from 'argon2';

// argon2id with the library's defaults (64 MiB, t=3, p=4): hashes every byte of long passphrases.
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id });
}

// A fixed hash to verify against when the e-mail is unknown, so both paths cost the same time.
let decoyHash: Promise<string> | undefined;

export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (hash === null) {
    decoyHash ??= argon2.hash('runnel-decoy-password', { type: argon2.argon2id });
    await argon2.verify(await decoyHash, password);
    return false;
  }
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}
