import { readWelderTest } from '../../database/welder-tests'
import { idParamSchema } from '#shared/schemas/list'

/** GET /api/tests/:id: one test with its verdicts, ranges and signatures; a welder may read only their own (404 otherwise) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector', 'welder'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await readWelderTest(await useDb(), user, id))
})
