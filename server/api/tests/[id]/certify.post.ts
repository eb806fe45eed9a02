import { certifyWelderTest } from '../../../database/welder-tests'
import { idParamSchema } from '#shared/schemas/list'
import { certifySchema } from '#shared/schemas/welder-test'

/** POST /api/tests/:id/certify: the inspector signs the result (certified or failed); the record is frozen after */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  const { version } = await validBody(event, certifySchema)
  return orThrow(await certifyWelderTest(await useDb(), id, version, user))
})
