import { idParamSchema } from '#shared/schemas/list'
import { confirmImportedTest } from '../../../database/imported-tests'

/** POST /api/imported-tests/:id/confirm: the inspector has checked the imported ranges against the original record */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['inspector'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await confirmImportedTest(await useDb(), user, id))
})
