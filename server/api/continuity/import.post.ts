import { importLog } from '../../database/continuity'
import { continuityImportSchema } from '#shared/schemas/continuity-entry'

/**
 * POST /api/continuity/import: a CSV (stamp, process, date, reference). Without `commit` it answers the preview and the
 * row errors; with `commit` it stores every row in one transaction, or nothing when any row is wrong (400 with the rows).
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { csv, commit } = await validBody(event, continuityImportSchema)
  return orThrow(await importLog(await useDb(), user, csv, commit, todayIso()))
})
