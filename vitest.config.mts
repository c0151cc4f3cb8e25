import { defineConfig } from "vitest/config";
import path from "node:path";

export default defineConfig({
  resolve: { alias: { "@": path.resolve(import.meta.dirname) } },
  test: {
    include: ["tests/**/*.test.ts", "lib/**/*.test.ts", "db/**/*.test.ts"],
    environment: "node",
    globalSetup: ["tests/helpers/global-setup.ts"],
    // One shared server and one browser per file: keep files from fighting over two cores.
    fileParallelism: !process.env.CI,
    testTimeout: 30_000,
    hookTimeout: 240_000,
  },
});
