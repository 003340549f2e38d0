import { APP_URL } from "./browser";
import { demoAccount } from "./browser";
import type { Role } from "@/db/schema/accounts";

/** Signs in with next-auth's credentials callback over plain HTTP and returns the Cookie header. */
export async function sessionCookie(role: Role): Promise<string> {
  const a = demoAccount(role);
  const csrf = await fetch(`${APP_URL}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = cookiesOf(csrf);
  const res = await fetch(`${APP_URL}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie: jar },
    body: new URLSearchParams({ email: a.email, password: a.password, csrfToken, callbackUrl: `${APP_URL}/home` }),
  });
  const all = [jar, cookiesOf(res)].filter(Boolean).join("; ");
  if (!/authjs\.session-token=/.test(all)) throw new Error(`sign-in as ${role} gave no session cookie (status ${res.status})`);
  return all;
}

function cookiesOf(res: Response): string {
  return res.headers
    .getSetCookie()
    .map((c) => c.split(";")[0])
    .join("; ");
}
