import { checkImport, insertEntries } from '../../database/continuity'
import { continuityImportSchema } from '#shared/schemas/continuity'

/**
 * POST /api/continuity/import: a CSV (stamp, process, date, reference). Without `commit` it answers the preview and the
 * row errors; with `commit` it stores every row in one transaction, or nothing when any row is wrong (400 with the rows).
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { csv, commit } = await validBody(event, continuityImportSchema)
  const db = await useDb()
  const { rows, errors } = await checkImport(db, csv, todayIso())
  const summary = { total: rows.length, errors, preview: rows.slice(0, 200), welders: new Set(rows.map(r => r.welderId)).size }
  if (!commit) return { ...summary, stored: 0 }
  if (errors.length) {
    throw httpError(invalid('body', [`${errors.length} row error${errors.length === 1 ? '' : 's'}: nothing was imported`], {}, errors))
  }
  const stored = await insertEntries(db, rows.map(({ welderId, process, weldedOn, reference }) => ({ welderId, process, weldedOn, reference })), user.id, 'import')
  return { ...summary, preview: [], stored }
})
