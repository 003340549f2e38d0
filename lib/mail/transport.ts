import nodemailer from "nodemailer";
import { smtpSettings } from "@/lib/env";

export type SmtpSettings = ReturnType<typeof smtpSettings>;

/** The SMTP transport of the mail job (the local mail fake in local mode: workers/mail-fake.ts). */
export function mailTransport(s: SmtpSettings = smtpSettings()) {
  return nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: false,
    ignoreTLS: true,
    auth: { user: s.user, pass: s.password },
    // A server that does not answer fails the try quickly; the job is retried with backoff.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}
