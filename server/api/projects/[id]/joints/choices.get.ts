import { idParamSchema } from '#shared/schemas/list'
import { registerChoices } from '../../../../database/joints'

/** GET /api/projects/:id/joints/choices: the project's WPSs and the roster, for the register's form */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'inspector'])
  const { id } = await validParams(event, idParamSchema)
  return orThrow(await registerChoices(await useDb(), user, id))
})
