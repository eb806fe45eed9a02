import { insertWelderTest } from '../../database/welder-tests'
import { welderTestSchema } from '#shared/schemas/welder-test'

/** POST /api/tests: the inspector records a welder test coupon; its ranges and verdicts are computed by the rules */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const input = await validBody(event, welderTestSchema)
  const row = orThrow(await insertWelderTest(await useDb(), input, user.id))
  setResponseStatus(event, 201)
  return row
})
