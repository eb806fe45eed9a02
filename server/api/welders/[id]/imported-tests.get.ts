import { idParamSchema } from '#shared/schemas/list'
import { mayReadWelder } from '../../../database/welders'
import { importedTestsOf } from '../../../database/imported-tests'

/** GET /api/welders/:id/imported-tests: test history brought in from the shop's records, as recorded (a welder their own) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  if (!await mayReadWelder(db, user, id)) throw httpError(missing('Welder'))
  return importedTestsOf(db, id)
})
