/**
 * Every environment variable the web app, the worker, the mail fake and the scripts read, checked
 * with one zod schema. `env()` parses process.env once per process; a wrong value stops the process
 * with a message naming the variable ("SMTP_PORT: expected a port number (1–65535), got "25x"").
 * Nothing else reads process.env, so defaults live here and only here.
 *
 * Read where they are (clearly scoped to tests or benchmarks, never by the product):
 * - tests: ECHOLINE_E2E_PORT_BASE (tests/helpers/browser.ts), ECHOLINE_TEMPLATE_READY (tests/run.ts,
 *   tests/setup/*), ECHOLINE_SKIP_BUILD (tests/run.ts, as `npm start` reads it here), and the
 *   variables unit tests set for the code under test (AUTH_SECRET, ECHOLINE_TEST_HOOKS);
 * - benchmarks: BENCH_SCALE, BENCH_REPEAT, BENCH_APP_PORT, BENCH_COUNT, BENCH_PAGES_PER, BENCH_QUEUES,
 *   BENCH_VERBOSE (tests/bench/*).
 * Scripts that start children (tests/run.ts, workers/stack.ts, db/cluster.ts) still pass process.env
 * on to them as a whole; that is copying, not reading.
 */
import path from "node:path";
import { z } from "zod";

const port = z.coerce
  .number({ message: "expected a port number (1–65535)" })
  .int("expected a port number (1–65535)")
  .min(1, "expected a port number (1–65535)")
  .max(65535, "expected a port number (1–65535)");
const flag = z.enum(["0", "1"], { message: 'expected "0" or "1"' }).optional();
const positiveSeconds = z.coerce.number({ message: "expected a number of seconds" }).positive("expected seconds > 0");
const url = z.url({ message: "expected a URL such as http://localhost:3000" });

export const envSchema = z.object({
  // --- database -------------------------------------------------------------------------------
  /** Unset: the private dev cluster of `npm start` (ECHOLINE_PG_PORT), so `npm run worker` finds it too. */
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, "expected a postgres:// URL")
    .optional(),
  ECHOLINE_PG_PORT: port.default(54320),
  ECHOLINE_TEST_PG_PORT: port.default(54321),

  // --- web app and sign-in ----------------------------------------------------------------------
  PORT: port.default(3000),
  /** Where people reach the app; links in mail point here. */
  AUTH_URL: url.optional(),
  APP_URL: url.optional(),
  /** next-auth's secret (the start scripts create one per data folder). Required by the web app. */
  AUTH_SECRET: z.string().min(16, "expected at least 16 characters").optional(),
  AUTH_TRUST_HOST: z.enum(["true", "false"], { message: 'expected "true" or "false"' }).optional(),
  NODE_ENV: z.enum(["development", "production", "test"]).optional(),

  // --- mail (one place: the mail job, the magic-link provider and the mail fake read these) ------
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: port.default(2525),
  SMTP_USER: z.string().default("echoline"),
  SMTP_PASSWORD: z.string().default("local"),
  MAIL_FROM: z.string().min(3).default("Echoline <no-reply@echoline.local>"),
  MAIL_FAKE_HTTP_PORT: port.default(2526),
  MAIL_FAKE_URL: url.optional(),
  MAIL_FAKE_DIR: z.string().min(1).optional(),

  // --- files ------------------------------------------------------------------------------------
  ECHOLINE_DATA_DIR: z.string().min(1).optional(),
  ECHOLINE_FILES_DIR: z.string().min(1).optional(),

  // --- worker -----------------------------------------------------------------------------------
  /** Only these queues (comma-separated), e.g. a machine that only mines. */
  ECHOLINE_WORKER_QUEUES: z.string().optional(),
  ECHOLINE_WORKER_SUPERVISE_SECONDS: z.coerce
    .number({ message: "expected a whole number of seconds >= 1" })
    .int("expected a whole number of seconds >= 1")
    .min(1, "expected a whole number of seconds >= 1")
    .default(15),
  ECHOLINE_MINING_CONCURRENCY: z.coerce
    .number({ message: "expected a whole number >= 1" })
    .int("expected a whole number >= 1")
    .min(1, "expected a whole number >= 1")
    .default(1),
  /** JSON laid over the mining retry preset (lib/jobs/presets.ts); checked there, field by field. */
  ECHOLINE_MINING_RETRY: z.string().optional(),
  ECHOLINE_MINER_HARD_TIMEOUT_SECONDS: positiveSeconds.optional(),
  ECHOLINE_MINER_VERSION: z.string().min(1).default("1"),
  ECHOLINE_WORKER_TIMINGS: flag,

  // --- npm start ----------------------------------------------------------------------------------
  ECHOLINE_SKIP_BUILD: flag,
  ECHOLINE_DEMO: flag,

  // --- test hooks (never set in production; the worker and the mining thread honour them) -------
  ECHOLINE_TEST_HOOKS: flag,
  ECHOLINE_TEST_WORKER_HANG_AFTER_READING: flag,
});

export type Env = z.infer<typeof envSchema>;

export class EnvError extends Error {
  constructor(public problems: { variable: string; message: string; value: string | undefined }[]) {
    super(
      "Environment variables with wrong values:\n" +
        problems
          .map((p) => `  ${p.variable}: ${p.message}${p.value === undefined ? "" : `, got ${JSON.stringify(p.value)}`}`)
          .join("\n"),
    );
    this.name = "EnvError";
  }
}

/** Parses an environment (process.env by default). Empty strings count as unset. */
export function parseEnv(source: Record<string, string | undefined> = process.env): Env {
  const input: Record<string, string> = {};
  for (const key of Object.keys(envSchema.shape)) {
    const v = source[key];
    if (v !== undefined && v !== "") input[key] = v;
  }
  const r = envSchema.safeParse(input);
  if (r.success) return r.data;
  throw new EnvError(
    r.error.issues.map((i) => {
      const variable = String(i.path[0] ?? "(environment)");
      return { variable, message: i.message, value: input[variable] };
    }),
  );
}

let cached: Env | null = null;
let cachedFrom: string | null = null;

/**
 * The checked environment of this process. Re-read when process.env changed since (the start
 * scripts add the stack's variables to their own environment before starting children).
 */
export function env(): Env {
  const key = Object.keys(envSchema.shape)
    .map((k) => process.env[k] ?? "")
    .join("\u0000");
  if (!cached || key !== cachedFrom) {
    cached = parseEnv(process.env);
    cachedFrom = key;
  }
  return cached;
}

/** The URL of a database in one of the private clusters (db/cluster.ts), from the same ports. */
export function clusterDatabaseUrl(cluster: "dev" | "test", database: string, e: Env = env()): string {
  const p = cluster === "dev" ? e.ECHOLINE_PG_PORT : e.ECHOLINE_TEST_PG_PORT;
  return `postgres://postgres@127.0.0.1:${p}/${database}`;
}

/**
 * The database the app and the worker use: DATABASE_URL, else the dev cluster's `echoline`
 * database exactly as `npm start` derives it, so a worker in a second terminal joins the same one.
 */
export function databaseUrl(e: Env = env()): string {
  return e.DATABASE_URL ?? clusterDatabaseUrl("dev", "echoline", e);
}

/** Where people reach the app (links in mail, redirects), without a trailing slash. */
export function appUrl(e: Env = env()): string {
  return (e.AUTH_URL ?? e.APP_URL ?? `http://localhost:${e.PORT}`).replace(/\/$/, "");
}

/** The SMTP server every mail goes through (the mail fake in local mode). */
export function smtpSettings(e: Env = env()) {
  return {
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    user: e.SMTP_USER,
    password: e.SMTP_PASSWORD,
    from: e.MAIL_FROM,
  };
}

/** The mail fake's HTTP address (local mode's "Captured mail" page reads it). */
export function mailFakeUrl(e: Env = env()): string {
  return e.MAIL_FAKE_URL ?? `http://127.0.0.1:${e.MAIL_FAKE_HTTP_PORT}`;
}

/** The folder of stored files: ECHOLINE_FILES_DIR, else `files/` in ECHOLINE_DATA_DIR, else the default. */
export function filesDir(e: Env = env()): string | undefined {
  return e.ECHOLINE_FILES_DIR ?? (e.ECHOLINE_DATA_DIR ? path.join(e.ECHOLINE_DATA_DIR, "files") : undefined);
}
