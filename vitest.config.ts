import { defineConfig } from "vitest/config";
import path from "node:path";

export default defineConfig({
  resolve: { alias: { "@": path.resolve(__dirname), "server-only": path.resolve(__dirname, "tests/unit/support/server-only.ts") } },
  test: {
    include: ["tests/unit/**/*.test.ts", "tests/verification/**/*.test.ts"],
    environment: "node",
    testTimeout: 30_000,
  },
});
