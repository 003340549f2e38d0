/**
 * The mail job's handler: render the template (every value escaped) and hand the message to SMTP.
 * A refused or unreachable server fails the try and pg-boss retries it with backoff (RETRY.mail);
 * the request that caused the mail has long returned.
 */
import type { Transporter } from "nodemailer";
import { sendMail } from "@/lib/jobs/mail";
import { renderMail } from "@/lib/mail/templates";
import { mailTransport } from "@/lib/mail/transport";
import { smtpSettings } from "@/lib/env";
import { eachJob, type Registered } from "./handler";

export type MailDeps = {
  /** The SMTP transport; tests point one at a server that refuses, or at the mail fake. */
  transport?: () => Pick<Transporter, "sendMail">;
  from?: string;
  log?: Pick<Console, "info" | "error">;
};

export function createMailHandler(deps: MailDeps = {}): Registered {
  const log = deps.log ?? console;
  let transport: Pick<Transporter, "sendMail"> | null = null;
  return eachJob(
    sendMail,
    async (data, meta) => {
      transport ??= deps.transport ? deps.transport() : mailTransport();
      const from = deps.from ?? smtpSettings().from;
      const info = await transport.sendMail({ from, to: data.to, ...renderMail(data) });
      log.info(`[worker] mail "${data.template}" job ${meta.id} sent (${String(info?.messageId ?? "no id")})`);
    },
    log,
  );
}
