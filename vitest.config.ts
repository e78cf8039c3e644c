import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL(".", import.meta.url));

// Two projects: pure foundry code (no database) and the HTTP API (its own throwaway PostgreSQL,
// started once by tests/api/global-setup.ts and removed afterwards).
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
          fileParallelism: false,
          testTimeout: 20000,
          hookTimeout: 60000,
        },
      },
    ],
  },
});
