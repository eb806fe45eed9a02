import { and, desc, eq, inArray, lt } from 'drizzle-orm'
import type { Db } from './client'
import { packetFiles, packets, projects } from './schema'
import { recordAudit } from './audit'
import { mayReadProject } from './projects'
import type { SessionUser } from '../utils/auth'
import { startPacket } from '../sheets/packet-job'
import { conflict, missing } from '../../shared/types/outcome'

// A project's packets: who may see one is who may read its project (mayReadProject). The build itself runs in
// server/sheets/packet-job.ts; the rows it keeps its progress in are written here.

/** A build not touched for this long was interrupted (its server stopped); it is reported as failed. */
const staleAfterMs = 10 * 60 * 1000

/** Marks builds whose process stopped as failed, so no page waits on them for ever. */
export async function failStalePackets(db: Db) {
  await db.update(packets).set({ status: 'failed', error: 'The build was interrupted; start it again.' })
    .where(and(inArray(packets.status, ['queued', 'building']), lt(packets.updatedAt, new Date(Date.now() - staleAfterMs))))
}

export const packetColumns = {
  id: packets.id, projectId: packets.projectId, status: packets.status, progress: packets.progress, pageCount: packets.pageCount,
  sha256: packets.sha256, error: packets.error, createdAt: packets.createdAt, updatedAt: packets.updatedAt,
}

/** The queued row of a new build, with the request in the audit trail. */
export async function createPacket(db: Db, projectId: number, user: SessionUser) {
  return db.transaction(async (tx) => {
    const [created] = await tx.insert(packets).values({ projectId, requestedBy: user.id, status: 'queued' }).returning()
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'packet.request', recordType: 'project', recordId: projectId, after: { packetId: created!.id } })
    return created!
  })
}

/** The build is running; with `progress` (a percent) it has got that far. */
export async function packetBuilding(db: Db, packetId: number, progress?: number) {
  await db.update(packets).set({ ...(progress === undefined ? {} : { progress }), status: 'building', updatedAt: new Date() }).where(eq(packets.id, packetId))
}

/** Stores the finished PDF and marks the build ready, in one transaction. */
export async function packetReady(db: Db, packetId: number, pdf: Uint8Array, pageCount: number, sha256: string) {
  await db.transaction(async (tx) => {
    await tx.insert(packetFiles).values({ packetId, content: pdf })
    await tx.update(packets).set({ status: 'ready', progress: 100, pageCount, sha256, storageKey: `packet_files:${packetId}`, updatedAt: new Date() })
      .where(eq(packets.id, packetId))
  })
}

export async function packetFailed(db: Db, packetId: number, error: string) {
  await db.update(packets).set({ status: 'failed', error, updatedAt: new Date() }).where(eq(packets.id, packetId))
}

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
