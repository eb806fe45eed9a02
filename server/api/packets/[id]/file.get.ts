import { eq } from 'drizzle-orm'
import { idParamSchema } from '#shared/schemas/list'
import { packetFiles, packets, projects } from '../../../database/schema'
import { mayReadProject } from '../../../database/projects'
import { sendPdf } from '../../../sheets/sheets'

/** GET /api/packets/:id/file: the finished packet PDF; every download goes into the audit trail */
export default defineEventHandler(async (event) => {
  const user = await requireRole(event, ['supervisor', 'auditor'])
  const { id } = await validParams(event, idParamSchema)
  const db = await useDb()
  const [row] = await db.select({ projectId: packets.projectId, status: packets.status, sha256: packets.sha256, pageCount: packets.pageCount, number: projects.number })
    .from(packets).innerJoin(projects, eq(projects.id, packets.projectId)).where(eq(packets.id, id))
  if (!row || !await mayReadProject(db, user, row.projectId)) throw httpError(missing('Packet'))
  if (row.status !== 'ready') throw httpError(conflict(`The packet is not ready (${row.status}).`))
  const [file] = await db.select({ content: packetFiles.content }).from(packetFiles).where(eq(packetFiles.packetId, id))
  if (!file) throw httpError(missing('Packet file'))
  await recordAudit(db, { accountId: user.id, action: 'packet.download', recordType: 'project', recordId: row.projectId, after: { packetId: id, sha256: row.sha256, pages: row.pageCount } })
  return sendPdf(event, Buffer.from(file.content), `Packet-${row.number}-${id}.pdf`)
})
