import { z } from 'zod'
import { mayReadProject } from '../../database/projects'
import { startPacket } from '../../sheets/packet-job'
import { publicOrigin } from '../../sheets/sheets'

const bodySchema = z.object({ projectId: z.number({ required_error: 'projectId is required', invalid_type_error: 'projectId must be a number' }).int().positive().max(2_147_483_647) }).strict()

/** POST /api/packets: start building a project's packet; answers 202 with the job to poll (quality manager, granted auditor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { projectId } = await validBody(event, bodySchema)
  const db = await useDb()
  if (!await mayReadProject(db, user, projectId)) throw httpError(missing('Project'))
  const packet = await startPacket(db, projectId, user, publicOrigin(event))
  setResponseStatus(event, 202)
  return { id: packet.id, projectId, status: packet.status, progress: packet.progress }
})
