// Password hashing with argon2id (OWASP's first choice); parameters are the library's defaults.
import { hash, verify } from "@node-rs/argon2";

export { MIN_PASSWORD_LENGTH } from "./password-rules";

export function hashPassword(plain: string): Promise<string> {
  return hash(plain);
}

export async function verifyPassword(passwordHash: string, plain: string): Promise<boolean> {
  try {
    return await verify(passwordHash, plain);
  } catch {
    return false;
  }
}
