import { sql } from "kysely";
import { getDb } from "@/db";

// Failed password attempts allowed in the window, per e-mail and per client address.
export const LIMITS = { windowMinutes: 15, perEmail: 5, perIp: 30 };

export async function checkRateLimit(email: string, ip: string): Promise<boolean> {
  const r = await getDb()
    .selectFrom("sign_in_attempts")
    .select([
      sql<number>`count(*) filter (where key = ${email})`.as("by_email"),
      sql<number>`count(*) filter (where ip = ${ip})`.as("by_ip"),
    ])
    .where("succeeded", "=", false)
    .where(sql<boolean>`at > now() - make_interval(mins => ${LIMITS.windowMinutes})`)
    .where((eb) => eb.or([eb("key", "=", email), eb("ip", "=", ip)]))
    .executeTakeFirstOrThrow();
  return Number(r.by_email) < LIMITS.perEmail && Number(r.by_ip) < LIMITS.perIp;
}

export async function recordAttempt(email: string, ip: string, succeeded: boolean): Promise<void> {
  await getDb().insertInto("sign_in_attempts").values({ key: email, ip, succeeded }).execute();
}
