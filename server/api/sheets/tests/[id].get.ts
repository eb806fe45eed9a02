import { idParamSchema } from '#shared/schemas/list'
import { sheetQuerySchema } from '#shared/schemas/sheet'
import { mayReadWelderTest } from '../../../database/welder-tests'
import { respondWithSheet } from '../../../sheets/download'
import { publicOrigin, welderTestSheet } from '../../../sheets/sheets'

/** GET /api/sheets/tests/:id: the WPQ sheet of a welder test; a welder only their own, an auditor their projects' welders' */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, everyone)
  const { id } = await validParams(event, idParamSchema)
  const { format } = await validQuery(event, sheetQuerySchema)
  const db = await useDb()
  if (!await mayReadWelderTest(db, user, id)) throw httpError(missing('Welder test'))
  const sheet = await welderTestSheet(db, id, publicOrigin(event))
  if (!sheet) throw httpError(missing('Welder test'))
  return respondWithSheet(event, db, user, sheet, format, { type: 'welder-test', id })
})
