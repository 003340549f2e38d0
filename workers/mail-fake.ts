/**
 * The local mail fake: an SMTP server on loopback that accepts any AUTH and keeps every message,
 * plus a small HTTP page and JSON API to read them (the app's admin "Captured mail" page uses it).
 * Messages are kept in memory and in .data/mail/ so a restart does not lose them.
 *
 * Captured mail holds sign-in links, so the HTTP side answers only a caller with the token the
 * process stack generates (MAIL_FAKE_TOKEN, passed to the web server in its environment) and only
 * under a loopback Host name: another local account without the token, or a web page that rebinds
 * its own DNS name to 127.0.0.1, gets nothing. The files are the owner's alone (0600 in a 0700 folder).
 */
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import http from "node:http";
import fs from "node:fs";
import path from "node:path";
import { createHash, randomBytes, randomUUID, timingSafeEqual } from "node:crypto";
import type { AddressInfo } from "node:net";
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

const FILE_MODE = 0o600;
const DIR_MODE = 0o700;

/** The request header that carries the token (a `?token=` query parameter works for the HTML page). */
export const MAIL_FAKE_TOKEN_HEADER = "x-mail-fake-token";

const digest = (s: string) => createHash("sha256").update(s).digest();

export function startMailFake(opts: { smtpPort: number; httpPort: number; dir: string; token: string }) {
  if (opts.token.length < 16) throw new Error("The mail fake needs a token of at least 16 characters.");
  const tokenDigest = digest(opts.token);
  fs.mkdirSync(opts.dir, { recursive: true, mode: DIR_MODE });
  // A folder (and files) made by an older version were world-readable.
  fs.chmodSync(opts.dir, DIR_MODE);
  const messages: CapturedMail[] = fs
    .readdirSync(opts.dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => {
      fs.chmodSync(path.join(opts.dir, f), FILE_MODE);
      return JSON.parse(fs.readFileSync(path.join(opts.dir, f), "utf8")) as CapturedMail;
    })
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
            { mode: FILE_MODE },
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
  const refuse = (res: http.ServerResponse, status: number, message: string) => {
    res.writeHead(status, { "content-type": "text/plain; charset=utf-8", "cache-control": "no-store" });
    res.end(message);
  };
  const web = http.createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://localhost");
    // Only our own loopback names with our own port: a rebinding page sends its own host name.
    const port = (web.address() as AddressInfo).port;
    const host = (req.headers.host ?? "").toLowerCase();
    if (![`localhost:${port}`, `127.0.0.1:${port}`, `[::1]:${port}`].includes(host))
      return refuse(res, 403, "This mail fake answers only on localhost or 127.0.0.1 with its own port.");
    const given = req.headers[MAIL_FAKE_TOKEN_HEADER] ?? url.searchParams.get("token");
    if (typeof given !== "string" || !timingSafeEqual(digest(given), tokenDigest))
      return refuse(res, 401, `The mail fake needs its token (the ${MAIL_FAKE_TOKEN_HEADER} header or ?token=).`);
    res.setHeader("cache-control", "no-store");
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
  const listening = (server: { once: (e: "listening", f: () => void) => unknown; listening: boolean }) =>
    new Promise<void>((resolve) => (server.listening ? resolve() : server.once("listening", resolve)));

  return {
    messages,
    /** Resolves with the bound ports once both servers listen (port 0 picks a free one). */
    ready: Promise.all([listening(smtp.server), listening(web)]).then(() => ({
      smtpPort: (smtp.server.address() as AddressInfo).port,
      httpPort: (web.address() as AddressInfo).port,
    })),
    close: () => new Promise<void>((resolve) => smtp.close(() => web.close(() => resolve()))),
  };
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const e = env();
  const smtpPort = e.SMTP_PORT;
  const httpPort = e.MAIL_FAKE_HTTP_PORT;
  const dir = e.MAIL_FAKE_DIR ?? path.resolve(import.meta.dirname, "..", ".data", "mail");
  // The process stack passes the token it gave the web server; started alone, make one up.
  const token = e.MAIL_FAKE_TOKEN || randomBytes(24).toString("base64url");
  const fake = startMailFake({ smtpPort, httpPort, dir, token });
  console.log(
    `[mail] fake SMTP on 127.0.0.1:${smtpPort}, captured mail at http://localhost:${httpPort}/?token=${token}`,
  );
  const stop = () => fake.close().then(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}
