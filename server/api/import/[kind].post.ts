import { importKindParamSchema, recordsImportSchema } from '#shared/schemas/records'
import { importRecords } from '../../database/records-import'

/**
 * POST /api/import/:kind (roster, continuity): a CSV or XLSX file with its column mapping. Without `commit` the dry run:
 * what will be created and every row error; with `commit` every row in one transaction, or nothing (400 with the rows).
 * Roster: the quality manager; continuity: staff.
 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, staff)
  const { kind } = await validParams(event, importKindParamSchema)
  if (kind === 'roster' && user.role !== 'supervisor') throw httpError(forbidden('Only the quality manager adds welders to the roster'))
  const input = await validBody(event, recordsImportSchema)
  return orThrow(await importRecords(await useDb(), user, kind, input, todayIso()))
})
