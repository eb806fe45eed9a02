import { insertWelderTest, RecordError } from '../../database/welder-tests'
import { welderTestSchema } from '#shared/schemas/welder-test'

/** POST /api/tests: the inspector records a welder test coupon; its ranges and verdicts are computed by the rules */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const input = await validBody(event, welderTestSchema)
  const db = await useDb()
  try {
    const row = await insertWelderTest(db, input, user.id)
    setResponseStatus(event, 201)
    return row
  }
  catch (error) {
    if (error instanceof RecordError) throw fieldError(error.field, error.message)
    throw error
  }
})
