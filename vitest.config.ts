import { defineConfig } from "vitest/config";
import { BaseSequencer, type TestSpecification } from "vitest/node";
import react from "@vitejs/plugin-react";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL(".", import.meta.url));

// The same slot arithmetic as tests/support/slot.ts (kept inline: the config is loaded before TypeScript paths).
const slotNumber = (() => {
  const n = Number(process.env.BARWRIGHT_TEST_SLOT ?? 0);
  return Number.isInteger(n) && n >= 0 && n <= 9 ? n : 0;
})();
const slotPort = (base: number) => base + 100 * slotNumber;
const slotDir = (base: string) => (slotNumber === 0 ? base : `${base}-slot${slotNumber}`);

/**
 * Files run in path order, the same every time. The browser tests share one
 * seeded demo workspace, and some change it (a price-list upload adds a sugar
 * quote), so a fixed order keeps hand-worked figures reproducible.
 */
class PathOrderSequencer extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    return [...files].sort((a, b) => a.moduleId.localeCompare(b.moduleId));
  }
}

/**
 * Three projects, one per kind of test. `npm test` runs them in order through
 * scripts/test.sh so that the integration and e2e projects get their throw-away
 * PostgreSQL cluster and built app.
 */
export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: {
      "@": root,
      "server-only": `${root}tests/support/server-only.ts`,
    },
  },
  test: {
    sequence: { sequencer: PathOrderSequencer },
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.{ts,tsx}"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/integration/global-setup.ts"],
          setupFiles: ["tests/integration/setup.ts"],
          env: {
            DATABASE_URL: `postgres://postgres@127.0.0.1:${slotPort(54339)}/barwright_test`,
            BARWRIGHT_PG_PORT: String(slotPort(54339)),
            BARWRIGHT_PG_DIR: slotDir(".data/pg-integration"),
            BARWRIGHT_PG_DB: "barwright_test",
            BARWRIGHT_PG_FAST: "1",
            BARWRIGHT_SMTP_URL: `smtp://127.0.0.1:${slotPort(2535)}`,
            BARWRIGHT_MAILBOX_DIR: slotDir(".data/mailbox-integration"),
            BARWRIGHT_DEMO_MAILBOX: "1",
            BARWRIGHT_S3_ENDPOINT: `http://127.0.0.1:${slotPort(4535)}`,
            BARWRIGHT_S3_BUCKET: "barwright-test",
          },
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          // After the unit and integration files, not beside them: the browser tests' timings
          // (a save shown as saved within 30 s) should not depend on the fuzz tests' CPU use.
          sequence: { sequencer: PathOrderSequencer, groupOrder: 1 },
          environment: "node",
          globalSetup: ["tests/e2e/global-setup.ts"],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
