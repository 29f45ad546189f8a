import { startServer } from "./bootstrap";
import { parseEnv } from "./env";

// Production entry: the database, SMTP service and client build are provided by the host.
async function main() {
  let env;
  try {
    env = parseEnv();
  } catch (error) {
    console.error((error as Error).message);
    process.exit(1);
  }
  const running = await startServer(env);
  running.ctx.logger.info(`Frostfold listening on http://${env.HOST}:${env.PORT}`);
  const stop = async () => {
    await running.close();
    process.exit(0);
  };
  process.once("SIGINT", stop);
  process.once("SIGTERM", stop);
}

void main();
