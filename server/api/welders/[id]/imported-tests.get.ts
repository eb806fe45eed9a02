import { idParamSchema } from '#shared/schemas/list'
import { importedTestsOf } from '../../../database/imported-tests'

/** GET /api/welders/:id/imported-tests: test history brought in from the shop's records, as recorded (a welder their own) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await importedTestsOf(await useDb(), user, id))
})
