import { desc, eq } from 'drizzle-orm'
import { idParamSchema } from '#shared/schemas/list'
import { packets } from '../../../../database/schema'
import { mayReadProject } from '../../../../database/projects'
import { failStalePackets, packetColumns } from '../../../../sheets/packet-job'

/** GET /api/projects/:id/packets: the packets built for a project, newest first (quality manager, granted auditor) */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  if (!await mayReadProject(db, user, id)) throw httpError(missing('Project'))
  await failStalePackets(db)
  return db.select(packetColumns).from(packets).where(eq(packets.projectId, id)).orderBy(desc(packets.id)).limit(20)
})
