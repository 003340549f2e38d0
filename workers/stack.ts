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

export type Stack = { children: Supervised[]; stop: () => Promise<void> };

export type Backoff = { initialMs: number; maxMs: number; resetAfterMs: number };
/** 1 s, doubling to 30 s while a process keeps dying; back to 1 s once it stayed up a minute. */
export const RESTART_BACKOFF: Backoff = { initialMs: 1_000, maxMs: 30_000, resetAfterMs: 60_000 };

export type Supervised = {
  name: string;
  /** The running child, or null between a death and its restart. */
  current(): ChildProcess | null;
  restarts(): number;
  stop(): Promise<void>;
};

/** How each process of the stack is started (the healing test starts the worker the same way). */
export const PROCESSES = {
  mail: () => ({ cmd: process.execPath, args: ["--import", "tsx", "workers/mail-fake.ts"] }),
  worker: () => ({ cmd: process.execPath, args: ["--import", "tsx", "workers/index.ts"] }),
  web: (port: number) => ({ cmd: bin("next"), args: ["start", "-H", "127.0.0.1", "-p", String(port)] }),
};

/**
 * Runs one child and restarts it whenever it dies, with backoff, saying so in the log. stop()
 * ends it (SIGTERM, SIGKILL after 20 s) and cancels a pending restart. A Ctrl-C reaches the children
 * too, but every restart waits at least `initialMs`, by which time the stack is stopping.
 */
export function superviseProcess(opts: {
  name: string;
  cmd: string;
  args: string[];
  env: NodeJS.ProcessEnv;
  quiet?: boolean;
  backoff?: Backoff;
  /** Where the supervisor's own lines go (default: stderr). */
  log?: (line: string) => void;
  /** Every output chunk of the child, after prefixing (tests read the worker's "ready" line here). */
  onOutput?: (text: string) => void;
}): Supervised {
  const backoff = opts.backoff ?? RESTART_BACKOFF;
  const log = opts.log ?? ((l: string) => process.stderr.write(l + "\n"));
  const { name } = opts;
  let child: ChildProcess | null = null;
  let stopping = false;
  let restarts = 0;
  let delay = backoff.initialMs;
  let timer: NodeJS.Timeout | null = null;

  const prefix = (chunk: Buffer) =>
    chunk
      .toString()
      .split("\n")
      .filter(Boolean)
      .map((l) => (l.startsWith(`[${name}]`) ? l : `[${name}] ${l}`))
      .join("\n") + "\n";

  const spawnOnce = () => {
    const startedAt = Date.now();
    const c = spawn(opts.cmd, opts.args, { cwd: ROOT, env: opts.env, stdio: ["ignore", "pipe", "pipe"] });
    child = c;
    c.stdout?.on("data", (chunk: Buffer) => {
      const text = prefix(chunk);
      opts.onOutput?.(text);
      if (!opts.quiet) process.stdout.write(text);
    });
    c.stderr?.on("data", (chunk: Buffer) => {
      const text = prefix(chunk);
      opts.onOutput?.(text);
      process.stderr.write(text);
    });
    c.on("error", (err) => log(`[stack] ${name} could not be started: ${err.message}`));
    c.on("exit", (code, signal) => {
      if (child === c) child = null;
      if (stopping) return;
      const upMs = Date.now() - startedAt;
      if (upMs >= backoff.resetAfterMs) delay = backoff.initialMs;
      log(
        `[stack] ${name} exited (${signal ?? `code ${code}`}) after ${(upMs / 1000).toFixed(1)} s; restarting in ${(delay / 1000).toFixed(0)} s`,
      );
      const wait = delay;
      delay = Math.min(delay * 2, backoff.maxMs);
      timer = setTimeout(() => {
        timer = null;
        if (stopping) return;
        restarts++;
        spawnOnce();
        log(`[stack] ${name} restarted (pid ${child?.pid}, restart ${restarts})`);
      }, wait);
    });
  };
  spawnOnce();

  return {
    name,
    current: () => child,
    restarts: () => restarts,
    stop: () => {
      stopping = true;
      if (timer) clearTimeout(timer);
      const c = child;
      if (!c || c.exitCode !== null || c.signalCode !== null) return Promise.resolve();
      return new Promise<void>((resolve) => {
        const t = setTimeout(() => c.kill("SIGKILL"), 20_000);
        c.once("exit", () => {
          clearTimeout(t);
          resolve();
        });
        c.kill("SIGTERM");
      });
    },
  };
}

/**
 * Starts the three processes and resolves once the web server and the mail fake answer. `spawned`
 * gets the stack at once, so a Ctrl-C during start-up can stop the children (and their restarts).
 */
export async function startStack(cfg: StackConfig, spawned?: (stack: Stack) => void): Promise<Stack> {
  const env = stackEnv(cfg);
  const children: Supervised[] = [];
  const start = (name: string, p: { cmd: string; args: string[] }) =>
    children.push(superviseProcess({ name, ...p, env, quiet: cfg.quiet }));
  start("mail", PROCESSES.mail());
  start("worker", PROCESSES.worker());
  start("web", PROCESSES.web(cfg.appPort));
  const stop = async () => {
    await Promise.all(children.map((c) => c.stop()));
  };
  spawned?.({ children, stop });
  try {
    await waitForHttp(`http://127.0.0.1:${cfg.appPort}/sign-in`, 90_000);
    await waitForHttp(`http://127.0.0.1:${cfg.mailHttpPort}/messages`, 30_000);
  } catch (err) {
    await stop();
    throw err;
  }
  return { children, stop };
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
