import { projectSchema } from '#shared/schemas/project'
import { createProject } from '../../database/projects'
import { invalidField } from '../../sheets/errors'

/** POST /api/projects: a new project for a customer (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const body = await validBody(event, projectSchema)
  const result = await createProject(await useDb(), body, user.id)
  if ('error' in result) {
    throw result.error === 'customer' ? invalidField('customerId', 'Choose an existing customer') : invalidField('number', 'A project of this number exists already')
  }
  setResponseStatus(event, 201)
  return result.row
})
