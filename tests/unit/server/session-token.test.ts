/**
 * The session cookie is read with next-auth's own token functions (next-auth/jwt `encode` makes the
 * tokens here exactly as its sign-in does), so these checks hold Echoline's reader to next-auth's
 * format: the cookie name, the __Secure- prefix over https, chunked cookies, expiry and tampering.
 */
import { describe, expect, it, beforeAll, afterEach, vi } from "vitest";
import { encode } from "next-auth/jwt";
import { sessionUserId, usesSecureCookie, SESSION_COOKIE } from "@/lib/server/session-token";

const SECRET = "unit-test-secret-unit-test-secret-0123456789";
const token = (sub: string, maxAge = 3600, salt = SESSION_COOKIE, secret = SECRET) =>
  encode({ token: { sub, email: `${sub}@example.invalid` }, secret, salt, maxAge });

beforeAll(() => {
  process.env.AUTH_SECRET = SECRET;
});
afterEach(() => vi.useRealTimers());

describe("sessionUserId", () => {
  it("gives the user id of a good cookie among others", async () => {
    const t = await token("user-a");
    expect(await sessionUserId(`authjs.csrf-token=abc; ${SESSION_COOKIE}=${t}; other=1`, null)).toBe("user-a");
    // Read twice: the second answer comes from the remembered token and must be the same.
    expect(await sessionUserId(`${SESSION_COOKIE}=${t}`, null)).toBe("user-a");
  });

  it("refuses no cookie, junk, a tampered token and a token made with another secret", async () => {
    expect(await sessionUserId(null, null)).toBeNull();
    expect(await sessionUserId("theme=dark", null)).toBeNull();
    expect(await sessionUserId(`${SESSION_COOKIE}=not-a-token`, null)).toBeNull();
    const t = await token("user-b");
    const i = Math.floor(t.length / 2);
    const tampered = t.slice(0, i) + (t[i] === "A" ? "B" : "A") + t.slice(i + 1);
    expect(await sessionUserId(`${SESSION_COOKIE}=${tampered}`, null)).toBeNull();
    expect(
      await sessionUserId(
        `${SESSION_COOKIE}=${await token("user-b", 3600, SESSION_COOKIE, "another-secret-another-secret-0123456789")}`,
        null,
      ),
    ).toBeNull();
  });

  it("refuses an expired token, also one it has read before", async () => {
    expect(await sessionUserId(`${SESSION_COOKIE}=${await token("user-c", -60)}`, null)).toBeNull();
    const t = await token("user-d", 120);
    expect(await sessionUserId(`${SESSION_COOKIE}=${t}`, null)).toBe("user-d");
    vi.useFakeTimers({ now: Date.now() + 121_000, toFake: ["Date"] });
    expect(await sessionUserId(`${SESSION_COOKIE}=${t}`, null)).toBeNull();
  });

  it("uses the __Secure- cookie over https and only there", async () => {
    const name = `__Secure-${SESSION_COOKIE}`;
    const t = await token("user-e", 3600, name);
    expect(await sessionUserId(`${name}=${t}`, "https")).toBe("user-e");
    expect(await sessionUserId(`${name}=${t}`, "http")).toBeNull();
    expect(usesSecureCookie(null, "https://echoline.example.invalid")).toBe(true);
    expect(usesSecureCookie(null, "http://localhost:3000")).toBe(false);
    expect(usesSecureCookie("https, http", "http://localhost:3000")).toBe(true);
  });

  it("reassembles a cookie next-auth split into chunks", async () => {
    const t = await token("user-f");
    const half = Math.floor(t.length / 2);
    expect(
      await sessionUserId(`${SESSION_COOKIE}.1=${t.slice(half)}; ${SESSION_COOKIE}.0=${t.slice(0, half)}`, null),
    ).toBe("user-f");
  });
});
