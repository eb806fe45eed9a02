import { insertEntries } from '../../database/continuity'
import { checkImportOffThread } from '../../workers/import-check'
import { continuityImportSchema } from '#shared/schemas/continuity'

/**
 * POST /api/continuity/import: a CSV (stamp, process, date, reference). Without `commit` it answers the preview and the
 * row errors; with `commit` it stores every row in one transaction, or nothing when any row is wrong (400 with the rows).
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { csv, commit } = await validBody(event, continuityImportSchema)
  const db = await useDb()
  // The CSV is parsed and checked in a worker thread (server/workers/import-check.ts).
  const { rows = [], ...summary } = await checkImportOffThread(db, csv, todayIso(), commit)
  const errors = summary.errors
  if (!commit) return { ...summary, stored: 0 }
  if (errors.length) {
    throw createError({
      statusCode: 400, statusMessage: 'Invalid body', message: `${errors.length} row error${errors.length === 1 ? '' : 's'}: nothing was imported`,
      data: { formErrors: [`${errors.length} row errors: nothing was imported`], fieldErrors: {}, rowErrors: errors },
    })
  }
  const stored = await insertEntries(db, rows.map(({ welderId, process, weldedOn, reference }) => ({ welderId, process, weldedOn, reference })), user.id, 'import')
  return { ...summary, preview: [], stored }
})
