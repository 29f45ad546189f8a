import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdirSync, readFileSync } from "node:fs";
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import path from "node:path";

const run = promisify(execFile);

/**
 * A MariaDB server owned by the project: its own data folder, loopback only, no system
 * config read (--no-defaults). Used by `npm start` (data in .data/mariadb) and by the tests
 * (their own folders and ports), so a test never touches the dev data.
 */
export interface LocalMariaDb {
  port: number;
  socket: string;
  /** root over the socket; the app connects over TCP as its own user */
  stop(): Promise<void>;
}

export async function startLocalMariaDb(options: { dataDir: string; port: number; log?: (line: string) => void }): Promise<LocalMariaDb> {
  const dataDir = path.resolve(options.dataDir);
  const socket = path.join(dataDir, "mysqld.sock");
  const pidFile = path.join(dataDir, "mysqld.pid");
  const log = options.log ?? (() => {});

  if (!existsSync(path.join(dataDir, "mysql"))) {
    mkdirSync(dataDir, { recursive: true });
    log(`creating MariaDB data folder ${dataDir}`);
    await run("mariadb-install-db", [
      "--no-defaults",
      `--datadir=${dataDir}`,
      "--user=root",
      "--auth-root-authentication-method=normal",
      "--skip-test-db",
    ]);
  }
  await stopStaleServer(pidFile, socket);

  const child: ChildProcess = spawn(
    "mariadbd",
    [
      "--no-defaults",
      `--datadir=${dataDir}`,
      "--user=root",
      `--port=${options.port}`,
      "--bind-address=127.0.0.1",
      "--skip-networking=0",
      `--socket=${socket}`,
      `--pid-file=${pidFile}`,
      `--log-error=${path.join(dataDir, "mysqld.err")}`,
      "--skip-name-resolve",
      "--character-set-server=utf8mb4",
      "--collation-server=utf8mb4_unicode_ci",
      "--innodb-buffer-pool-size=64M",
      "--innodb-flush-log-at-trx-commit=2",
    ],
    { stdio: "ignore", detached: false },
  );
  let exited = false;
  const exitPromise = new Promise<void>((resolve) => child.once("exit", () => {
    exited = true;
    resolve();
  }));

  const deadline = Date.now() + 30_000;
  for (;;) {
    if (exited) throw new Error(`MariaDB exited at start; see ${path.join(dataDir, "mysqld.err")}`);
    try {
      await run("mariadb-admin", ["--no-defaults", `--socket=${socket}`, "-uroot", "ping"]);
      break;
    } catch {
      if (Date.now() > deadline) throw new Error(`MariaDB did not answer within 30 s; see ${path.join(dataDir, "mysqld.err")}`);
      await new Promise((r) => setTimeout(r, 100));
    }
  }
  log(`MariaDB listening on 127.0.0.1:${options.port}`);

  return {
    port: options.port,
    socket,
    async stop() {
      if (exited) return;
      // mariadb-admin shutdown returns before the process exits, so wait on the process too.
      await run("mariadb-admin", ["--no-defaults", `--socket=${socket}`, "-uroot", "shutdown"]).catch(() => child.kill("SIGTERM"));
      let timer: NodeJS.Timeout | undefined;
      await Promise.race([exitPromise, new Promise((r) => (timer = setTimeout(r, 15_000)))]);
      clearTimeout(timer);
      if (!exited) child.kill("SIGKILL");
    },
  };
}

/** A server left behind by a killed run holds the data folder's lock: stop it first. */
async function stopStaleServer(pidFile: string, socket: string): Promise<void> {
  if (!existsSync(pidFile)) return;
  const pid = Number(readFileSync(pidFile, "utf8").trim());
  if (!Number.isInteger(pid) || pid <= 0) return;
  try {
    process.kill(pid, 0);
  } catch {
    return; // not running
  }
  await run("mariadb-admin", ["--no-defaults", `--socket=${socket}`, "-uroot", "shutdown"]).catch(() => {
    try { process.kill(pid, "SIGTERM"); } catch { /* already gone */ }
  });
  for (let i = 0; i < 150; i++) {
    try {
      process.kill(pid, 0);
      await new Promise((r) => setTimeout(r, 100));
    } catch {
      return;
    }
  }
}

/** Creates the database and an app user that may only reach it over loopback TCP. */
export async function ensureDatabase(db: LocalMariaDb, name: string, user: string, password: string): Promise<void> {
  if (!/^[a-z0-9_]+$/.test(name) || !/^[a-z0-9_]+$/.test(user) || !/^[A-Za-z0-9_-]+$/.test(password)) {
    throw new Error("database name, user and password must be simple identifiers");
  }
  const sql = [
    `CREATE DATABASE IF NOT EXISTS \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    `CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';`,
    `GRANT ALL PRIVILEGES ON \`${name}\`.* TO '${user}'@'127.0.0.1';`,
    "FLUSH PRIVILEGES;",
  ].join(" ");
  await run("mariadb", ["--no-defaults", `--socket=${db.socket}`, "-uroot", "-e", sql]);
}

export async function dropDatabase(db: LocalMariaDb, name: string): Promise<void> {
  await run("mariadb", ["--no-defaults", `--socket=${db.socket}`, "-uroot", "-e", `DROP DATABASE IF EXISTS \`${name}\`;`]);
}
