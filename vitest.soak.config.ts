import { defineConfig } from "vitest/config";

/** `npm run soak`: the invariants over thousands of generated scenarios per code (not part of `npm test`). */
export default defineConfig({
  test: {
    include: ["test/soak/**/*.soak.ts"],
    testTimeout: 24 * 3600 * 1000,
    fileParallelism: false,
  },
});
