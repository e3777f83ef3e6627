import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = { "@": path.resolve(import.meta.dirname) };
// "server-only" throws outside a React Server environment; tests import server modules directly.
const serverOnlyStub = { "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") };

export default defineConfig({
  test: {
    projects: [
      {
        resolve: { alias: { ...alias, ...serverOnlyStub } },
        test: { name: "unit", include: ["tests/unit/**/*.test.{ts,tsx}"], environment: "node", testTimeout: 30_000 },
      },
      {
        resolve: { alias: { ...alias, ...serverOnlyStub } },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          exclude: ["tests/integration/faults/**"],
          environment: "node",
          globalSetup: ["tests/support/integration-global-setup.ts"],
          setupFiles: ["tests/support/integration-setup.ts"],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        // Fault tests: their own PostgreSQL cluster and MailDev, stopped and started on purpose (npm run test:faults).
        resolve: { alias: { ...alias, ...serverOnlyStub } },
        test: {
          name: "faults",
          include: ["tests/integration/faults/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/integration/faults/support/fault-global-setup.ts"],
          setupFiles: ["tests/integration/faults/support/fault-setup.ts"],
          fileParallelism: false,
          testTimeout: 180_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          // The scale journeys need the scaled-out shape: `npm run test:scale`.
          exclude: ["tests/e2e/scale/**", "**/node_modules/**"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "scale",
          include: ["tests/e2e/scale/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 180_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
