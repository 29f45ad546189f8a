import { DEMO_PASSWORD, DEMO_USERS } from "../db/seed/demo";
import { startLocalStack } from "./stack";

// `npm start`: the dev data lives in .data/mariadb and survives restarts.
const log = (line: string) => console.log(`[frostfold] ${line}`);

const stack = await startLocalStack({
  dataDir: ".data/mariadb",
  port: Number(process.env.PORT ?? 3000),
  dbPort: Number(process.env.DB_PORT ?? 3307),
  smtpPort: Number(process.env.SMTP_PORT ?? 2525),
  database: "frostfold",
  log,
}).catch((error: Error) => {
  console.error(`[frostfold] could not start: ${error.message}`);
  process.exit(1);
});

log(`Frostfold is running at ${stack.origin}`);
log(`local mail goes to the SMTP fake on 127.0.0.1:${stack.smtp.port}; owners read it on the Outbox page`);
log(`demo accounts (password "${DEMO_PASSWORD}"):`);
for (const u of DEMO_USERS) log(`  ${u.role.padEnd(10)} ${u.email}`);
log("press Ctrl-C to stop everything");

let stopping = false;
const stop = async () => {
  if (stopping) return;
  stopping = true;
  log("stopping the server, the SMTP fake and MariaDB ...");
  await stack.stop();
  log("stopped");
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
