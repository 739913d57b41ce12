// Passwords are hashed with Argon2id (memory-hard), from @node-rs/argon2.
import { hash, verify } from '@node-rs/argon2';

export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

// A real hash to verify against when the e-mail is unknown, so an unknown user
// takes as long to refuse as a wrong password.
let dummyHash: Promise<string> | null = null;

export async function verifyPassword(storedHash: string | null, password: string): Promise<boolean> {
  if (storedHash === null) {
    dummyHash ??= hash('no such user: timing only');
    await verify(await dummyHash, password);
    return false;
  }
  try {
    return await verify(storedHash, password);
  } catch {
    return false;
  }
}
