/**
 * The env module: defaults as the start scripts expect them, one URL derivation for `npm start` and
 * `npm run worker`, and a message that names each wrong variable.
 */
import { describe, expect, it } from "vitest";
import { appUrl, clusterDatabaseUrl, databaseUrl, EnvError, parseEnv, smtpSettings } from "@/lib/env";

describe("parseEnv", () => {
  it("an empty environment gives the local defaults", () => {
    const e = parseEnv({});
    expect(e.SMTP_PORT).toBe(2525);
    expect(e.PORT).toBe(3000);
    expect(databaseUrl(e)).toBe("postgres://postgres@127.0.0.1:54320/echoline");
    expect(appUrl(e)).toBe("http://localhost:3000");
  });

  it("without DATABASE_URL the worker finds the cluster of npm start on ECHOLINE_PG_PORT", () => {
    const e = parseEnv({ ECHOLINE_PG_PORT: "54352" });
    expect(databaseUrl(e)).toBe(clusterDatabaseUrl("dev", "echoline", e));
    expect(databaseUrl(e)).toBe("postgres://postgres@127.0.0.1:54352/echoline");
    expect(databaseUrl(parseEnv({ ECHOLINE_PG_PORT: "54352", DATABASE_URL: "postgres://u@h:5/d" }))).toBe(
      "postgres://u@h:5/d",
    );
  });

  it("SMTP settings are read in one place, with one set of defaults", () => {
    expect(smtpSettings(parseEnv({ SMTP_HOST: "mail.example.invalid", SMTP_PORT: "587" }))).toEqual({
      host: "mail.example.invalid",
      port: 587,
      user: "echoline",
      password: "local",
      from: "Echoline <no-reply@echoline.local>",
    });
  });

  it("names every wrong variable with the value it got, and treats empty values as unset", () => {
    let err: unknown;
    try {
      parseEnv({ SMTP_PORT: "25x", DATABASE_URL: "mysql://x", ECHOLINE_DEMO: "yes", PORT: "" });
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(EnvError);
    const msg = (err as Error).message;
    expect(msg).toMatch(/SMTP_PORT: expected a port number \(1–65535\), got "25x"/);
    expect(msg).toMatch(/DATABASE_URL: expected a postgres:\/\/ URL, got "mysql:\/\/x"/);
    expect(msg).toMatch(/ECHOLINE_DEMO: expected "0" or "1", got "yes"/);
    expect(msg).not.toMatch(/PORT: .*got ""/);
    expect((err as EnvError).problems.map((p) => p.variable).sort()).toEqual([
      "DATABASE_URL",
      "ECHOLINE_DEMO",
      "SMTP_PORT",
    ]);
  });

  it("a port out of range is refused (TCP ports are 16-bit, RFC 793)", () => {
    expect(() => parseEnv({ MAIL_FAKE_HTTP_PORT: "70000" })).toThrow(/MAIL_FAKE_HTTP_PORT/);
    expect(() => parseEnv({ ECHOLINE_WORKER_SUPERVISE_SECONDS: "0" })).toThrow(/ECHOLINE_WORKER_SUPERVISE_SECONDS/);
  });
});
