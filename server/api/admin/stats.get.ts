import { rowCounts } from '../../database/admin'

/** GET /api/admin/stats: how many rows each table holds, for the quality manager's view of the database */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  const { db, driver } = await useDatabase()
  return { driver, tables: await rowCounts(db) }
})
