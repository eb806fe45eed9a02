import { idParamSchema } from '#shared/schemas/list'
import { projectPatchSchema } from '#shared/schemas/project'
import { updateProject } from '../../database/projects'
import { invalidField } from '../../sheets/errors'

/** PATCH /api/projects/:id: change number, name, customer or period (quality manager); a stale version is a 409 */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const body = await validBody(event, projectPatchSchema)
  const result = await updateProject(await useDb(), id, body, user.id)
  if ('row' in result) return result.row
  switch (result.error) {
    case 'missing': throw notFound('Project')
    case 'stale': throw conflict('Someone changed this project since you opened it; reload and try again.')
    case 'customer': throw invalidField('customerId', 'Choose an existing customer')
    case 'period': throw invalidField('endsOn', 'The end must not be before the start')
    default: throw invalidField('number', 'A project of this number exists already')
  }
})
