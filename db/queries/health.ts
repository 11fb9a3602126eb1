import { sql } from 'drizzle-orm';
import type { Db } from '../open';

/** The readiness probe's question: does the database answer? (It says nothing about any shop.) */
export async function databaseAnswers(db: Db): Promise<void> {
  await db.execute(sql`select 1`);
}
