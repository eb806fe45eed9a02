import { desc, eq } from 'drizzle-orm'
import type { Db } from './client'
import { packetFiles, packets, projects } from './schema'
import { recordAudit } from './audit'
import { mayReadProject } from './projects'
import type { SessionUser } from '../utils/auth'
import { failStalePackets, packetColumns, startPacket } from '../sheets/packet-job'
import { conflict, missing } from '../../shared/types/outcome'

// A project's packets: who may see one is who may read its project (mayReadProject). The build itself runs in
// server/sheets/packet-job.ts.

/** Starts building a project's packet as a job to poll. */
export async function requestPacket(db: Db, user: SessionUser, projectId: number, origin: string) {
  if (!await mayReadProject(db, user, projectId)) return missing('Project')
  const packet = await startPacket(db, projectId, user, origin)
  return { id: packet.id, projectId, status: packet.status, progress: packet.progress }
}

/** The packets built for a project, newest first. */
export async function projectPackets(db: Db, user: SessionUser, projectId: number) {
  if (!await mayReadProject(db, user, projectId)) return missing('Project')
  await failStalePackets(db)
  return db.select(packetColumns).from(packets).where(eq(packets.projectId, projectId)).orderBy(desc(packets.id)).limit(20)
}

/** Where one packet build stands. */
export async function packetStatus(db: Db, user: SessionUser, id: number) {
  await failStalePackets(db)
  const [row] = await db.select(packetColumns).from(packets).where(eq(packets.id, id))
  if (!row || !await mayReadProject(db, user, row.projectId)) return missing('Packet')
  return row
}

/** A finished packet's PDF and its project number; every download goes into the audit trail. */
export async function packetDownload(db: Db, user: SessionUser, id: number) {
  const [row] = await db.select({ projectId: packets.projectId, status: packets.status, sha256: packets.sha256, pageCount: packets.pageCount, number: projects.number })
    .from(packets).innerJoin(projects, eq(projects.id, packets.projectId)).where(eq(packets.id, id))
  if (!row || !await mayReadProject(db, user, row.projectId)) return missing('Packet')
  if (row.status !== 'ready') return conflict(`The packet is not ready (${row.status}).`)
  const [file] = await db.select({ content: packetFiles.content }).from(packetFiles).where(eq(packetFiles.packetId, id))
  if (!file) return missing('Packet file')
  await recordAudit(db, { accountId: user.id, action: 'packet.download', recordType: 'project', recordId: row.projectId, after: { packetId: id, sha256: row.sha256, pages: row.pageCount } })
  return { content: Buffer.from(file.content), fileName: `Packet-${row.number}-${id}.pdf` }
}
