import { idParamSchema } from '#shared/schemas/list'
import { sheetQuerySchema } from '#shared/schemas/sheet'
import { mayReadProcedure } from '../../../database/procedures'
import { respondWithSheet } from '../../../sheets/download'
import { procedureSheet, publicOrigin } from '../../../sheets/sheets'

/** GET /api/sheets/procedures/:id: the WPS sheet (PDF, or ?format=json); welders approved WPSs only, auditors their projects' */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const { format } = await validQuery(event, sheetQuerySchema)
  const db = await useDb()
  if (!await mayReadProcedure(db, user, id)) throw httpError(missing('Procedure'))
  const sheet = await procedureSheet(db, id, publicOrigin(event))
  if (!sheet) throw httpError(missing('Procedure'))
  return respondWithSheet(event, db, user, sheet, format, { type: 'procedure', id })
})
