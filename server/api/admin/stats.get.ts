import { count, getTableName, is } from 'drizzle-orm'
import { PgTable } from 'drizzle-orm/pg-core'
import * as schema from '../../database/schema'

const tables = (Object.values(schema) as unknown[]).filter((value): value is PgTable => is(value, PgTable))

/** GET /api/admin/stats: how many rows each table holds, for the quality manager's view of the database */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const { db, driver } = await useDatabase()
  const rows = await Promise.all(tables.map(async (table) => {
    const [row] = await db.select({ n: count() }).from(table)
    return [getTableName(table), row?.n ?? 0] as const
  }))
  return { driver, tables: Object.fromEntries(rows) }
})
