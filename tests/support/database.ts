import { sql } from "drizzle-orm";
import type { Db } from "../../server/db/client";

/** Empties every table the migrations made, children and parents alike. */
export async function resetDatabase(db: Db): Promise<void> {
  const [rows] = (await db.execute(
    sql`select table_name as name from information_schema.tables where table_schema = database() and table_name <> '__drizzle_migrations'`,
  )) as unknown as [{ name: string }[]];
  // One connection for all of it: foreign_key_checks is a per-session setting.
  await db.transaction(async (tx) => {
    await tx.execute(sql`set foreign_key_checks = 0`);
    for (const { name } of rows) await tx.execute(sql.raw(`truncate table \`${name}\``));
    await tx.execute(sql`set foreign_key_checks = 1`);
  });
}

export async function countRows(db: Db, table: string): Promise<number> {
  if (!/^[a-z_]+$/.test(table)) throw new Error("bad table name");
  const [rows] = (await db.execute(sql.raw(`select count(*) as n from \`${table}\``))) as unknown as [{ n: number }[]];
  return Number(rows[0].n);
}
