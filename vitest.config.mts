import { defineConfig } from "vitest/config";
import path from "node:path";

export default defineConfig({
  resolve: { alias: { "@": path.resolve(__dirname) } },
  test: {
    include: ["tests/**/*.test.ts", "lib/**/*.test.ts", "db/**/*.test.ts"],
    environment: "node",
    testTimeout: 30_000,
    hookTimeout: 240_000,
  },
});
