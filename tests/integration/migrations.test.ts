import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sql, Migrator, NO_MIGRATIONS, type Kysely } from "kysely";
import { createTestDatabase } from "../helpers/db";
import { migrations } from "@/migrations";

let t: Awaited<ReturnType<typeof createTestDatabase>>;
beforeAll(async () => {
  t = await createTestDatabase();
});
afterAll(async () => t?.drop());

describe("migrations", () => {
  it("create every table of the Database type", async () => {
    const r = await sql<{
      table_name: string;
    }>`select table_name from information_schema.tables where table_schema = 'public'`.execute(t.db);
    const names = r.rows.map((x) => x.table_name);
    for (const table of [
      "User",
      "articles",
      "statements",
      "citations",
      "references",
      "works",
      "practices",
      "trails",
      "source_checks",
      "screenings",
      "casebooks",
      "job_events",
    ]) {
      expect(names).toContain(table);
    }
  });

  it("go down to nothing and up again", async () => {
    const migrator = new Migrator({
      db: t.db as unknown as Kysely<unknown>,
      provider: { getMigrations: async () => migrations },
    });
    const down = await migrator.migrateTo(NO_MIGRATIONS);
    expect(down.error).toBeUndefined();
    const up = await migrator.migrateToLatest();
    expect(up.error).toBeUndefined();
    expect(up.results?.length).toBe(Object.keys(migrations).length);
  });

  it("keep one article per file content (the same file twice is one article)", async () => {
    const sha = "a".repeat(64);
    await t.db
      .insertInto("stored_files")
      .values({ sha256: sha, size_bytes: 1, media_type: "application/pdf", storage_key: "x" })
      .execute();
    await t.db
      .insertInto("articles")
      .values({ file_sha256: sha, original_filename: "a.pdf", source_kind: "pdf" })
      .execute();
    await expect(
      t.db
        .insertInto("articles")
        .values({ file_sha256: sha, original_filename: "b.pdf", source_kind: "pdf" })
        .execute(),
    ).rejects.toMatchObject({ code: "23505" });
  });
});
