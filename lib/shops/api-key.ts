// Shop API keys: 32 random bytes, shown once; only their SHA-256 is stored. A key names no
// shop itself: the database row does, so a key can never be pointed at another shop.
import { createHash, randomBytes } from "node:crypto";

export const KEY_PREFIX = "tyk_";

export function newApiKey(): { key: string; start: string; hash: string } {
  const key = `${KEY_PREFIX}${randomBytes(32).toString("base64url")}`;
  return { key, start: key.slice(0, KEY_PREFIX.length + 6), hash: hashApiKey(key) };
}

export function hashApiKey(key: string): string {
  return createHash("sha256").update(key).digest("hex");
}

/** The key from `Authorization: Bearer tyk_…` or `x-api-key`, or null when there is none. */
export function apiKeyFrom(headers: Headers): string | null {
  const auth = headers.get("authorization");
  const bearer = auth?.match(/^Bearer\s+(\S+)$/i)?.[1];
  const key = bearer ?? headers.get("x-api-key");
  return key?.startsWith(KEY_PREFIX) && key.length < 200 ? key : null;
}
