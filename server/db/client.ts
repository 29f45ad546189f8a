import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import * as schema from "./schema";

export function createDb(databaseUrl: string) {
  const pool = mysql.createPool({ uri: databaseUrl, connectionLimit: 10, charset: "utf8mb4_unicode_ci", timezone: "Z", dateStrings: false });
  const db = drizzle(pool, { schema, mode: "default" });
  return { db, pool };
}
export type Db = ReturnType<typeof createDb>["db"];
/** Either the pool-backed db or a transaction handle: repositories accept both. */
export type Tx = Db | Parameters<Parameters<Db["transaction"]>[0]>[0];
