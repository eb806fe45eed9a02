import { tableCountsForExport } from '../../database/records-archive'

/** GET /api/export: every table the export hands out, with its row count (quality manager) */
export default defineEventHandler(async (event) => {
  await requireRole(event, ['supervisor'])
  return tableCountsForExport(await useDb())
})
