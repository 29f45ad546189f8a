import { startLocalStack } from "./stack";

// Playwright's webServer: its own data folder and ports, a fresh database every run.
const port = Number(process.env.E2E_PORT ?? 3100);
// Every spec signs its people in from this one loopback address, so the per-address sign-in
// limit (20 per window) would refuse the later specs; the limit itself is proven by the API tests.
process.env.SIGN_IN_LIMIT_PER_IP ??= "200";
const stack = await startLocalStack({
  // E2E_DATA_DIR lets two browser-test runs on one machine keep apart (each stops a stale server in its folder).
  dataDir: process.env.E2E_DATA_DIR ?? ".data/e2e-mariadb",
  port,
  dbPort: Number(process.env.E2E_DB_PORT ?? 3327),
  smtpPort: Number(process.env.E2E_SMTP_PORT ?? 2545),
  database: "frostfold_e2e",
  freshDatabase: true,
  log: (line) => console.log(`[e2e] ${line}`),
});
console.log(`[e2e] serving ${stack.origin}`);
const stop = async () => {
  await stack.stop();
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
