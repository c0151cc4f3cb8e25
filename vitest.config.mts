import { defineConfig } from "vitest/config";
import path from "node:path";

export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      // server/ files start with import "server-only"; Next.js resolves it, vitest needs an empty stand-in.
      "server-only": path.resolve(import.meta.dirname, "tests/helpers/server-only.ts"),
    },
  },
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
