import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

const alias = { "@": fileURLToPath(new URL(".", import.meta.url)) };

// Four suites with their own pace: unit and reference run in parallel threads;
// integration and e2e share one database and one browser, so they run one file at a time.
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      { resolve: { alias }, test: { name: "reference", include: ["tests/reference/**/*.test.ts"], environment: "node" } },
      {
        resolve: { alias },
        test: { name: "integration", include: ["tests/integration/**/*.test.ts"], environment: "node", fileParallelism: false, testTimeout: 30000, hookTimeout: 60000 },
      },
      {
        resolve: { alias },
        test: { name: "e2e", include: ["tests/e2e/**/*.test.ts"], environment: "node", fileParallelism: false, testTimeout: 60000, hookTimeout: 120000 },
      },
    ],
  },
});
