import { idParamSchema } from '#shared/schemas/list'
import { attachWelderSchema } from '#shared/schemas/project'
import { attach } from '../../../../database/projects'
import { invalidField } from '../../../../sheets/errors'

/** POST /api/projects/:id/welders: attach a welder to the project (quality manager) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor'])
  const { id } = await validParams(event, idParamSchema)
  const { welderId } = await validBody(event, attachWelderSchema)
  const result = await attach(await useDb(), id, 'welder', welderId, user.id)
  if ('ok' in result) return { ok: true }
  if (result.error === 'project') throw notFound('Project')
  throw invalidField('welderId', result.error === 'draft' ? 'A draft WPS cannot go into a packet; approve it first' : 'Choose an existing welder')
})
