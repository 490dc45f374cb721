import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = { "@": path.resolve(import.meta.dirname) };

// unit: lib/ logic, no services. api and browser: run by `npm test` against the app it starts. The projects run one
// after another in this order (groupOrder), so the browser tests never share the app with the API tests' bursts.
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node", sequence: { groupOrder: 0 } },
      },
      {
        resolve: { alias },
        test: {
          name: "api",
          sequence: { groupOrder: 1 },
          include: ["tests/api/**/*.test.ts", "tests/integration/**/*.test.ts"],
          environment: "node",
          testTimeout: 20_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "browser",
          sequence: { groupOrder: 2 },
          include: ["tests/browser/**/*.test.ts"],
          environment: "node",
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
          // Headless Chromium on a busy two-core machine now and then stops drawing frames, and playwright waits for
          // frames before a click. A second try absorbs that; a real fault fails both tries.
          retry: 1,
        },
      },
    ],
  },
});
