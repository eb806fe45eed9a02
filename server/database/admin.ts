import { count, getTableName, is, sql } from 'drizzle-orm'
import { PgTable } from 'drizzle-orm/pg-core'
import type { Db } from './client'
import * as schema from './schema'

// What the operator asks of the database itself: is it there, and how much does it hold.

const tables = (Object.values(schema) as unknown[]).filter((value): value is PgTable => is(value, PgTable))

/** How many rows each table holds. */
export async function rowCounts(db: Db) {
  const rows = await Promise.all(tables.map(async (table) => {
    const [row] = await db.select({ n: count() }).from(table)
    return [getTableName(table), row?.n ?? 0] as const
  }))
  return Object.fromEntries(rows)
}

/** Answers once the database is open and migrated. */
export async function ping(db: Db) {
  await db.execute(sql`select 1`)
}
