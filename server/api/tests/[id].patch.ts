import { updateWelderTest } from '../../database/welder-tests'
import { idParamSchema } from '#shared/schemas/list'
import { welderTestPatchSchema } from '#shared/schemas/welder-test'

/** PATCH /api/tests/:id: the inspector edits a test not yet certified (409 when frozen or stale) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  const input = await validBody(event, welderTestPatchSchema)
  return orThrow(await updateWelderTest(await useDb(), id, input, user.id))
})
