/**
 * Browser tests: the built app (tests/run.ts builds it) with its worker and mail fake, on test
 * ports, against a fresh test database seeded with the demo accounts. Never the user's data.
 */
import type { Kysely } from "kysely";
import type { TestProject } from "vitest/node";
import pg from "pg";
import path from "node:path";
import fs from "node:fs";
import { up, databaseUrl, DATA_DIR } from "@/db/cluster";
import { createDb } from "@/db";
import { migrateToLatest } from "@/db/migrate";
import { seedAll } from "@/db/seed";
import { startStack, stackEnv, type Stack } from "@/workers/stack";
import { prepareTemplate } from "./db-global";
import { E2E_PORT_BASE } from "../helpers/browser";

export const E2E = {
  appPort: E2E_PORT_BASE,
  smtpPort: E2E_PORT_BASE - 475,
  mailHttpPort: E2E_PORT_BASE - 474,
  database: "echoline_e2e",
};

let stack: Stack | null = null;

declare module "vitest" {
  export interface ProvidedContext {
    /** The mail fake's HTTP token of this run (tests read captured mail with it). */
    mailFakeToken: string;
  }
}

export default async function setup(project: TestProject) {
  up("test");
  if (process.env.ECHOLINE_TEMPLATE_READY !== "1") await prepareTemplate();
  const admin = new pg.Client({ connectionString: databaseUrl("test", "postgres") });
  await admin.connect();
  await admin.query(`drop database if exists ${E2E.database} with (force)`);
  await admin.query(`create database ${E2E.database} template echoline_template`);
  await admin.end();
  const dataDir = path.join(DATA_DIR, "e2e");
  fs.rmSync(dataDir, { recursive: true, force: true });
  const cfg = {
    appPort: E2E.appPort,
    smtpPort: E2E.smtpPort,
    mailHttpPort: E2E.mailHttpPort,
    databaseUrl: databaseUrl("test", E2E.database),
    dataDir,
    quiet: true,
  };
  Object.assign(process.env, stackEnv(cfg));
  const db = createDb(cfg.databaseUrl, 2);
  await migrateToLatest(db as unknown as Kysely<unknown>);
  await seedAll(db);
  await db.destroy();
  stack = await startStack(cfg);
  project.provide("mailFakeToken", process.env.MAIL_FAKE_TOKEN ?? "");
  return async () => {
    await stack?.stop();
  };
}
