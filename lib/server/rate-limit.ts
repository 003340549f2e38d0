import { getDb } from "@/db";
import { failedSignIns, recordSignInAttempt } from "@/db/queries/accounts";

// Failed password attempts allowed in the window, per e-mail and per client address.
export const LIMITS = { windowMinutes: 15, perEmail: 5, perIp: 30 };

export async function checkRateLimit(email: string, ip: string): Promise<boolean> {
  const n = await failedSignIns(getDb(), email, ip, LIMITS.windowMinutes);
  return n.byEmail < LIMITS.perEmail && n.byIp < LIMITS.perIp;
}

export async function recordAttempt(email: string, ip: string, succeeded: boolean): Promise<void> {
  await recordSignInAttempt(getDb(), email, ip, succeeded);
}
