import { defineConfig } from "vitest/config";
import path from "node:path";

// Three projects: unit tests need nothing running; integration tests get a fresh database per suite
// (tests/setup/db.ts makes a template once); browser tests drive the built app through Chromium.
export default defineConfig({
  resolve: { alias: { "@": path.resolve(import.meta.dirname) } },
  test: {
    testTimeout: 30_000,
    hookTimeout: 180_000,
    projects: [
      { extends: true, test: { name: "unit", include: ["tests/unit/**/*.test.ts"] } },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          globalSetup: ["tests/setup/db-global.ts"],
          testTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: "browser",
          include: ["tests/browser/**/*.test.ts"],
          globalSetup: ["tests/setup/app-global.ts"],
          fileParallelism: false,
          testTimeout: 120_000,
        },
      },
    ],
  },
});
