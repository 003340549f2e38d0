/**
 * Reads who is signed in straight from next-auth's session cookie: the same cookie name, salt and
 * decryption next-auth uses (its own `getToken`/`decode` from next-auth/jwt), without running its
 * whole session endpoint on every request. That endpoint also re-encrypts a fresh token, which a page
 * or route handler then throws away (only /api/auth/session could set it), so skipping it changes no
 * behaviour: the token still expires 8 hours after sign-in, and the role is still read from the
 * database by the caller.
 *
 * Decrypting the token costs about 1 ms of Web Crypto per request (key derivation, AES-CBC and HMAC
 * through the async crypto pool; measured), so a decrypted token is remembered by its exact text
 * until its own expiry. That is safe: a token cannot change without changing its text, a remembered
 * one is refused after its `exp` like a fresh one, and deactivation and role changes are still
 * checked in the database on every request.
 */
import { decode, getToken } from "next-auth/jwt";
import { LRUCache } from "lru-cache";
import { env } from "@/lib/env";

export const SESSION_COOKIE = "authjs.session-token";

/** next-auth prefixes the cookie with __Secure- when the site is served over https. */
export function usesSecureCookie(forwardedProto: string | null, authUrl = env().AUTH_URL ?? ""): boolean {
  const proto =
    forwardedProto?.split(",")[0]?.trim() || (authUrl ? new URL(authUrl).protocol.replace(":", "") : "http");
  return proto === "https";
}

/**
 * The user id in a valid, unexpired session cookie, or null. Only the Cookie header is looked at
 * (never an Authorization header), and any token that fails to decrypt or has expired gives null.
 */
export async function sessionUserId(cookie: string | null, forwardedProto: string | null): Promise<string | null> {
  if (!cookie || !cookie.includes(SESSION_COOKIE)) return null;
  const secret = env().AUTH_SECRET;
  if (!secret) throw new Error("AUTH_SECRET is not set");
  const secureCookie = usesSecureCookie(forwardedProto);
  const req = { headers: new Headers({ cookie }) };
  const raw = await getToken({ req, secret, secureCookie, raw: true });
  if (!raw) return null;
  const now = Date.now() / 1000;
  const known = decrypted.get(raw);
  if (known) return known.exp > now ? known.sub : null;
  // The cookie is already parsed: decrypt its text with next-auth's salt (the cookie's own name).
  const salt = secureCookie ? `__Secure-${SESSION_COOKIE}` : SESSION_COOKIE;
  const token = await decode({ token: raw, secret, salt }).catch(() => null);
  const sub = typeof token?.sub === "string" && token.sub ? token.sub : null;
  const exp = typeof token?.exp === "number" ? token.exp : 0;
  // Only good tokens are remembered, so a flood of junk cookies cannot push real sessions out.
  if (sub && exp > now) decrypted.set(raw, { sub, exp });
  return sub;
}

/** Decrypted session tokens by their text; a few thousand concurrent sessions at most. */
const decrypted = new LRUCache<string, { sub: string; exp: number }>({ max: 5000 });
