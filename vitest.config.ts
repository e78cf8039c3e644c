import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL(".", import.meta.url));

// Three projects: pure foundry code (no database); the HTTP API (its own throwaway PostgreSQL,
// started once by tests/api/global-setup.ts and removed afterwards); and the browser tests
// (npm run test:e2e: the built web app served by the real server, driven in Debian's chromium).
export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    projects: [
      {
        extends: true,
        test: { name: "rules", include: ["tests/rules/**/*.test.ts"], environment: "node" },
      },
      {
        extends: true,
        test: {
          name: "api",
          include: ["tests/api/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/api/global-setup.ts"],
          setupFiles: ["tests/api/setup.ts"],
          testTimeout: 20000,
          hookTimeout: 60000,
        },
      },
      {
        // `npm run dev` in a real browser: needs no web export, so no e2e global setup.
        extends: true,
        test: {
          name: "dev",
          include: ["tests/dev/**/*.test.ts"],
          environment: "node",
          testTimeout: 60000,
          hookTimeout: 300000,
        },
      },
      {
        // The few components with logic, rendered through react-native-web in jsdom.
        extends: true,
        resolve: { alias: { "react-native": "react-native-web" } },
        test: {
          name: "components",
          include: ["tests/components/**/*.test.tsx"],
          environment: "jsdom",
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/e2e/global-setup.ts"],
          fileParallelism: false,
          // One retry: a browser step on a loaded 2-core machine can miss its wait once. A test that
          // fails twice still fails the run.
          retry: 1,
          testTimeout: 60000,
          hookTimeout: 300000,
        },
      },
    ],
  },
});
