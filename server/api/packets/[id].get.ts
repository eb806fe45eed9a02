import { eq } from 'drizzle-orm'
import { idParamSchema } from '#shared/schemas/list'
import { packets } from '../../database/schema'
import { mayReadProject } from '../../database/projects'
import { failStalePackets, packetColumns } from '../../sheets/packet-job'

/** GET /api/packets/:id: where a packet build stands (status, progress, pages); for polling */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  await failStalePackets(db)
  const [row] = await db.select(packetColumns).from(packets).where(eq(packets.id, id))
  if (!row || !await mayReadProject(db, user, row.projectId)) throw httpError(missing('Packet'))
  setResponseHeader(event, 'cache-control', 'no-store')
  return row
})
