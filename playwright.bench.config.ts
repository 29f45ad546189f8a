import { defineConfig } from "@playwright/test";
import base from "./playwright.config";

// The browser timing scripts of `npm run bench`: the same stack and browser as the browser
// tests, on ports and a data folder of their own so they can run beside them.
const port = Number(process.env.BENCH_E2E_PORT ?? 3160);

export default defineConfig({
  ...base,
  testDir: "tests/bench/browser",
  reporter: [["list"]],
  use: { ...base.use, baseURL: `http://127.0.0.1:${port}` },
  webServer: {
    ...base.webServer,
    command: `E2E_PORT=${port} E2E_DB_PORT=${process.env.BENCH_E2E_DB_PORT ?? 3367} E2E_SMTP_PORT=${process.env.BENCH_E2E_SMTP_PORT ?? 2565} E2E_DATA_DIR=.data/bench-e2e-mariadb npx tsx server/local/e2e-server.ts`,
    url: `http://127.0.0.1:${port}/api/health`,
  },
});
