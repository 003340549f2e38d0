/**
 * The local mail fake: an SMTP server on loopback that accepts any AUTH and keeps every message,
 * plus a small HTTP page and JSON API to read them (the app's admin "Captured mail" page uses it).
 * Messages are kept in memory and in .data/mail/ so a restart does not lose them.
 */
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import http from "node:http";
import fs from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { env } from "@/lib/env";

export type CapturedMail = {
  id: string;
  at: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
};

export function startMailFake(opts: { smtpPort: number; httpPort: number; dir: string }) {
  fs.mkdirSync(opts.dir, { recursive: true });
  const messages: CapturedMail[] = fs
    .readdirSync(opts.dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(fs.readFileSync(path.join(opts.dir, f), "utf8")) as CapturedMail)
    .sort((a, b) => a.at.localeCompare(b.at));

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    // Accept any credentials: next-auth's e-mail provider always sends some.
    onAuth: (_auth, _session, cb) => cb(null, { user: "local" }),
    size: 5 * 1024 * 1024,
    onData(stream, session, cb) {
      simpleParser(stream)
        .then((m) => {
          const to = session.envelope.rcptTo.map((r) => r.address);
          const mail: CapturedMail = {
            id: randomUUID(),
            at: new Date().toISOString(),
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            to,
            subject: m.subject ?? "",
            text: m.text ?? "",
            html: typeof m.html === "string" ? m.html : null,
          };
          messages.push(mail);
          fs.writeFileSync(
            path.join(opts.dir, `${mail.at.replace(/[:.]/g, "-")}-${mail.id}.json`),
            JSON.stringify(mail),
          );
          cb();
        })
        .catch((err: Error) => cb(err));
    },
  });
  smtp.on("error", (err) => console.error("[mail] smtp error:", err.message));
  smtp.listen(opts.smtpPort, "127.0.0.1");

  const esc = (s: string) =>
    s.replace(/[&<>"]/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[c]!);
  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://localhost");
    if (url.pathname === "/messages") {
      const to = url.searchParams.get("to")?.toLowerCase();
      const list = to ? messages.filter((m) => m.to.some((t) => t.toLowerCase() === to)) : messages;
      res.setHeader("content-type", "application/json");
      res.end(JSON.stringify([...list].reverse()));
      return;
    }
    res.setHeader("content-type", "text/html; charset=utf-8");
    res.end(
      `<!doctype html><title>Echoline mail fake</title><h1>Captured mail (${messages.length})</h1>` +
        [...messages]
          .reverse()
          .map(
            (m) =>
              `<article><h2>${esc(m.subject)}</h2><p>To ${esc(m.to.join(", "))} · ${m.at}</p><pre>${esc(m.text)}</pre></article>`,
          )
          .join("<hr>"),
    );
  });
  web.listen(opts.httpPort, "127.0.0.1");

  return {
    messages,
    close: () => new Promise<void>((resolve) => smtp.close(() => web.close(() => resolve()))),
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const e = env();
  const smtpPort = e.SMTP_PORT;
  const httpPort = e.MAIL_FAKE_HTTP_PORT;
  const dir = e.MAIL_FAKE_DIR ?? path.resolve(import.meta.dirname, "..", ".data", "mail");
  const fake = startMailFake({ smtpPort, httpPort, dir });
  console.log(`[mail] fake SMTP on 127.0.0.1:${smtpPort}, captured mail at http://localhost:${httpPort}/`);
  const stop = () => fake.close().then(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}
