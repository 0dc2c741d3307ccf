import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";
import path from "node:path";

const alias = { "@": path.resolve(import.meta.dirname) };
// `server-only` throws outside a React Server Component bundle; in tests the
// query modules are imported from plain Node, so it is stubbed here.
const serverOnly = { "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts") };

export default defineConfig({
  plugins: [react()],
  resolve: { alias: { ...alias, ...serverOnly } },
  test: {
    projects: [
      {
        extends: true,
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" },
      },
      {
        extends: true,
        test: { name: "hooks", include: ["tests/hooks/**/*.test.{ts,tsx}"], environment: "happy-dom" },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          // The Lighthouse budget is its own command (`npm run lighthouse`) until every page meets it
          // on this machine run after run; it is not yet part of `npm test`.
          exclude: process.env.LIGHTHOUSE === "1" ? [] : ["tests/e2e/lighthouse.test.ts"],
          environment: "node",
          testTimeout: 120_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
