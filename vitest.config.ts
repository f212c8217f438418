import { availableParallelism } from "node:os";
import { defineConfig } from "vitest/config";

// Two projects: "node" (unit, reference, property; fast, no browser) and "browser" (the built
// site served by `vite preview`, driven in Debian's Chromium by playwright-core).
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: "node",
          include: ["test/unit/**/*.test.ts", "test/reference/**/*.test.ts", "test/property/**/*.test.ts"],
          environment: "node",
          // Every core (vitest's default leaves one for itself, which on a 2-core machine ran the files
          // one at a time: 363 s); the main process only gathers results.
          maxWorkers: availableParallelism(),
          // Property tests that run the risk pipeline take seconds; on a loaded 2-core machine the
          // 5 s default was seen to cut one off. Wall time is never asserted, so allow plenty.
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: "browser",
          include: ["test/browser/**/*.test.ts"],
          environment: "node",
          globalSetup: ["test/browser/serve.ts"],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
          // Every results page designs in workers, so a result follows an edit after the designs run
          // (a second or two on a loaded 2-core machine, not the next frame): polls wait for them.
          expect: { poll: { timeout: 20_000 } },
        },
      },
    ],
  },
});
