import { idParamSchema } from '#shared/schemas/list'
import { sheetQuerySchema } from '#shared/schemas/sheet'
import { mayReadPqr } from '../../../database/pqrs'
import { respondWithSheet } from '../../../sheets/download'
import { pqrSheetOf, publicOrigin } from '../../../sheets/sheets'

/** GET /api/sheets/pqrs/:id: the PQR sheet (PDF, or ?format=json); auditors only PQRs behind their projects' WPSs */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const { format } = await validQuery(event, sheetQuerySchema)
  const db = await useDb()
  if (!await mayReadPqr(db, user, id)) throw httpError(missing('PQR'))
  const sheet = await pqrSheetOf(db, id, publicOrigin(event))
  if (!sheet) throw httpError(missing('PQR'))
  return respondWithSheet(event, db, user, sheet, format, { type: 'pqr', id })
})
