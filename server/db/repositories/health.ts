import { sql } from "drizzle-orm";
import type { Db } from "../client";

export async function pingDatabase(db: Db): Promise<void> {
  await db.execute(sql`select 1`);
}
