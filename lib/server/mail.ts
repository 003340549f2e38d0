import nodemailer from "nodemailer";

// In local mode the transport is the mail fake started by `npm start` (workers/mail-fake.ts).
export function mailTransport() {
  return nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: false,
    ignoreTLS: true,
    auth: { user: process.env.SMTP_USER ?? "echoline", pass: process.env.SMTP_PASSWORD ?? "local" },
  });
}

export const MAIL_FROM = process.env.MAIL_FROM ?? "Echoline <no-reply@echoline.local>";

export function appUrl(): string {
  return (process.env.AUTH_URL ?? process.env.APP_URL ?? "http://localhost:3000").replace(/\/$/, "");
}
