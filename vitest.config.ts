import { defineConfig } from "vitest/config";

// Two projects: "unit" runs pure shared/ code in parallel; "api" runs server tests
// against the real test PostgreSQL, one file at a time because they share that database.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: "unit",
          include: ["shared/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        test: {
          name: "api",
          include: ["server/**/*.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 120_000,
          fileParallelism: false,
          globalSetup: ["server/test/global-setup.ts"],
        },
      },
    ],
  },
});
