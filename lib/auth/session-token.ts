import { hkdfSync } from "node:crypto";
import { jwtDecrypt } from "jose";
import type { JWT, JWTDecodeParams } from "next-auth/jwt";

// next-auth's own decode derives the same key with HKDF on every call (a trip
// through libuv's thread pool per request); derive it once per secret instead.
// Same derivation (HKDF-SHA256, empty salt, next-auth's info string), same JWE check.
const sessionKeys = new Map<string, Uint8Array>();
function sessionKey(secret: string): Uint8Array {
  let key = sessionKeys.get(secret);
  if (!key) {
    key = new Uint8Array(hkdfSync("sha256", secret, "", "NextAuth.js Generated Encryption Key", 32));
    sessionKeys.set(secret, key);
  }
  return key;
}

export async function decodeSession({ token, secret }: JWTDecodeParams): Promise<JWT | null> {
  if (!token) return null;
  const { payload } = await jwtDecrypt(token, sessionKey(String(secret)), { clockTolerance: 15 });
  return payload as JWT;
}
