/**
 * Inviting a person and resending an invitation. The e-mail is a job (lib/jobs/mail.ts) sent in the
 * same transaction as the invitation: if SMTP is down the admin's request still succeeds, the mail
 * job retries on its own, and a "resend" gives a fresh link later. Nothing here talks to SMTP.
 */
import type { Transaction } from "kysely";
import type { Database } from "@/db";
import { createInvitation, renewInvitation } from "@/db/queries/accounts";
import { sendMail } from "@/lib/jobs/mail";
import { appUrl } from "@/lib/env";
import type { Role } from "@/lib/vocabulary";

type Inviter = { id: string; name: string | null; email: string };

const inviteLink = (token: string) => `${appUrl()}/invite/${token}`;

/** Creates the person and their invitation and queues the e-mail. A taken e-mail fails with 23505. */
export async function invitePerson(
  trx: Transaction<Database>,
  input: { email: string; role: Role; venueIds: string[] },
  by: Inviter,
) {
  const created = await createInvitation(trx, { ...input, invitedBy: by.id });
  const mailJobId = await sendMail.send(trx, {
    template: "invitation",
    to: input.email,
    link: inviteLink(created.token),
    role: input.role,
    inviter: by.name ?? by.email,
  });
  return { userId: created.userId, mailJobId };
}

/**
 * A new link for a person whose invitation is still open (the old link stops working), and the
 * e-mail queued with it. Says why when there is nothing to resend.
 */
export async function resendInvitation(
  trx: Transaction<Database>,
  userId: string,
  by: Inviter,
): Promise<{ mailJobId: string | null } | "not_found" | "accepted" | "deactivated"> {
  const r = await renewInvitation(trx, { userId, renewedBy: by.id });
  if (r === null) return "not_found";
  if (r === "accepted" || r === "deactivated") return r;
  const mailJobId = await sendMail.send(trx, {
    template: "invitation",
    to: r.email,
    link: inviteLink(r.token),
    role: r.role,
    inviter: by.name ?? by.email,
  });
  return { mailJobId };
}
