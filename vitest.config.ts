import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL(".", import.meta.url));
const alias = { "@": root, "server-only": fileURLToPath(new URL("./tests/support/server-only.ts", import.meta.url)) };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts", "tests/reference/**/*.test.ts"], environment: "node" } },
      { resolve: { alias }, test: { name: "integration", include: ["tests/integration/**/*.test.ts"], environment: "node",
          fileParallelism: false, testTimeout: 60_000, hookTimeout: 120_000 } },
      { resolve: { alias }, test: { name: "e2e", include: ["tests/e2e/**/*.spec.ts"], environment: "node",
          fileParallelism: false, testTimeout: 120_000, hookTimeout: 300_000 } },
    ],
  },
});
