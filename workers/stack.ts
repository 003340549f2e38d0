/**
 * Starts Echoline's processes (mail fake, worker, Next server) as children, for `npm start` and for
 * the browser tests alike, and stops them cleanly. All bound to loopback.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";

export const ROOT = path.resolve(import.meta.dirname, "..");
const bin = (name: string) => path.join(ROOT, "node_modules", ".bin", name);

export type StackConfig = {
  appPort: number;
  smtpPort: number;
  mailHttpPort: number;
  databaseUrl: string;
  dataDir: string;
  /** Prefix for log lines; tests keep output quiet unless something fails. */
  quiet?: boolean;
};

/** A stable secret kept in the data folder, so sessions survive restarts. */
export function authSecret(dataDir: string): string {
  const file = path.join(dataDir, "auth-secret");
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, randomBytes(32).toString("base64url"), { mode: 0o600 });
  }
  return fs.readFileSync(file, "utf8").trim();
}

export function stackEnv(cfg: StackConfig): NodeJS.ProcessEnv {
  return {
    ...process.env,
    NODE_ENV: "production",
    DATABASE_URL: cfg.databaseUrl,
    AUTH_SECRET: authSecret(cfg.dataDir),
    AUTH_URL: `http://localhost:${cfg.appPort}`,
    AUTH_TRUST_HOST: "true",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(cfg.smtpPort),
    MAIL_FAKE_HTTP_PORT: String(cfg.mailHttpPort),
    MAIL_FAKE_URL: `http://127.0.0.1:${cfg.mailHttpPort}`,
    MAIL_FAKE_DIR: path.join(cfg.dataDir, "mail"),
    // Generated once per start (kept in process.env by the caller): the web server reads captured mail with it.
    MAIL_FAKE_TOKEN: process.env.MAIL_FAKE_TOKEN || randomBytes(24).toString("base64url"),
    ECHOLINE_DATA_DIR: cfg.dataDir,
    NEXT_TELEMETRY_DISABLED: "1",
  };
}

export function runBuild(env: NodeJS.ProcessEnv = process.env): Promise<void> {
  return new Promise((resolve, reject) => {
    const p = spawn(bin("next"), ["build"], {
      cwd: ROOT,
      env: { ...env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production" },
      stdio: "inherit",
    });
    p.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`next build failed (${code})`))));
  });
}

export type Stack = { children: ChildProcess[]; stop: () => Promise<void> };

export async function startStack(cfg: StackConfig): Promise<Stack> {
  const env = stackEnv(cfg);
  const children: ChildProcess[] = [];
  const start = (name: string, cmd: string, args: string[]) => {
    const child = spawn(cmd, args, { cwd: ROOT, env, stdio: ["ignore", "pipe", "pipe"] });
    const prefix = (chunk: Buffer) =>
      chunk
        .toString()
        .split("\n")
        .filter(Boolean)
        .map((l) => (l.startsWith(`[${name}]`) ? l : `[${name}] ${l}`))
        .join("\n") + "\n";
    child.stdout?.on("data", (c: Buffer) => !cfg.quiet && process.stdout.write(prefix(c)));
    child.stderr?.on("data", (c: Buffer) => process.stderr.write(prefix(c)));
    child.on("exit", (code, signal) => {
      if (!stopping && (code !== 0 || signal)) console.error(`[${name}] exited (${code ?? signal})`);
    });
    children.push(child);
    return child;
  };
  let stopping = false;
  start("mail", process.execPath, ["--import", "tsx", "workers/mail-fake.ts"]);
  start("worker", process.execPath, ["--import", "tsx", "workers/index.ts"]);
  start("web", bin("next"), ["start", "-H", "127.0.0.1", "-p", String(cfg.appPort)]);
  await waitForHttp(`http://127.0.0.1:${cfg.appPort}/sign-in`, 90_000);
  await waitForHttp(`http://127.0.0.1:${cfg.mailHttpPort}/messages`, 30_000);
  return {
    children,
    stop: async () => {
      stopping = true;
      await Promise.all(
        children.map(
          (c) =>
            new Promise<void>((resolve) => {
              if (c.exitCode !== null || c.signalCode !== null) return resolve();
              const t = setTimeout(() => c.kill("SIGKILL"), 20_000);
              c.once("exit", () => {
                clearTimeout(t);
                resolve();
              });
              c.kill("SIGTERM");
            }),
        ),
      );
    },
  };
}

export async function waitForHttp(url: string, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  let last: unknown;
  while (Date.now() < until) {
    try {
      const r = await fetch(url, { redirect: "manual" });
      if (r.status < 500) return;
      last = new Error(`status ${r.status}`);
    } catch (e) {
      last = e;
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${timeoutMs} ms: ${String(last)}`);
}
