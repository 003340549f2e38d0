import { APP_URL, demoAccount } from "./browser";
import type { Role } from "@/db/schema/accounts";

/** Signs in with next-auth's credentials callback over plain HTTP and returns the Cookie header. */
export async function signInOverHttp(base: string, email: string, password: string): Promise<string> {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = cookiesOf(csrf);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar },
    body: new URLSearchParams({ email, password, csrfToken, callbackUrl: `${base}/home` }),
  });
  const all = [jar, cookiesOf(res)].filter(Boolean).join("; ");
  if (!/authjs\.session-token=/.test(all))
    throw new Error(`sign-in as ${email} gave no session cookie (status ${res.status})`);
  return all;
}

/** The demo account of a role, signed in on the e2e app. */
export async function sessionCookie(role: Role): Promise<string> {
  const a = demoAccount(role);
  return signInOverHttp(APP_URL, a.email, a.password);
}

function cookiesOf(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}
