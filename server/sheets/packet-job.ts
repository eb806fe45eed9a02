import { createHash } from 'node:crypto'
import { and, eq, inArray, lt } from 'drizzle-orm'
import type { Db } from '../database/client'
import { packetFiles, packets } from '../database/schema'
import { appendicesOf } from '../database/sheet-records'
import { appendFiles } from './appendices'
import type { SessionUser } from '../utils/auth'
import { buildPacket, packetPlan } from './packet'
import { recordAudit } from '../database/audit'

/** A build not touched for this long was interrupted (its server stopped); it is reported as failed. */
const staleAfterMs = 10 * 60 * 1000

/**
 * Starts a packet build in this process and returns at once with the queued row. Progress and the result are kept
 * in the database, so any app server can answer the polling and hand out the file.
 */
export async function startPacket(db: Db, projectId: number, user: SessionUser, origin: string) {
  const row = await db.transaction(async (tx) => {
    const [created] = await tx.insert(packets).values({ projectId, requestedBy: user.id, status: 'queued' }).returning()
    await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'packet.request', recordType: 'project', recordId: projectId, after: { packetId: created!.id } })
    return created!
  })
  void runPacket(db, row.id, projectId, user, origin)
  return row
}

async function runPacket(db: Db, packetId: number, projectId: number, user: SessionUser, origin: string) {
  let last = -1
  const progress = async (fraction: number) => {
    const percent = Math.min(99, Math.floor(fraction * 100))
    if (percent < last + 3) return // a write every few percent is enough for a progress bar
    last = percent
    await db.update(packets).set({ progress: percent, status: 'building', updatedAt: new Date() }).where(eq(packets.id, packetId))
  }
  try {
    await db.update(packets).set({ status: 'building', updatedAt: new Date() }).where(eq(packets.id, packetId))
    const plan = await packetPlan(db, projectId)
    if (!plan) throw new Error('The project no longer exists')
    const built = await buildPacket(db, plan, user, origin, progress)
    const { sheets, timing } = built
    // Attached files (lab and radiography reports, sketches, photos) follow the sheets as appendices.
    const files = await appendicesOf(db, plan)
    const { pdf, pageCount } = files.length ? await appendFiles(new Uint8Array(built.pdf), files) : built
    console.info(`[rootface] packet ${packetId}: ${sheets} sheets, ${pageCount} pages; sheets read in ${timing.modelsMs} ms, laid out and rendered in ${timing.renderMs} ms`)
    const sha256 = createHash('sha256').update(pdf).digest('hex')
    await db.transaction(async (tx) => {
      await tx.insert(packetFiles).values({ packetId, content: new Uint8Array(pdf) })
      await tx.update(packets).set({ status: 'ready', progress: 100, pageCount, sha256, storageKey: `packet_files:${packetId}`, updatedAt: new Date() })
        .where(eq(packets.id, packetId))
    })
  }
  catch (error) {
    console.error(`[rootface] packet ${packetId} failed`, error)
    await db.update(packets).set({ status: 'failed', error: error instanceof Error ? error.message : String(error), updatedAt: new Date() })
      .where(eq(packets.id, packetId)).catch(() => {})
  }
}

/** Marks builds whose process stopped as failed, so no page waits on them for ever. */
export async function failStalePackets(db: Db) {
  await db.update(packets).set({ status: 'failed', error: 'The build was interrupted; start it again.' })
    .where(and(inArray(packets.status, ['queued', 'building']), lt(packets.updatedAt, new Date(Date.now() - staleAfterMs))))
}

export const packetColumns = {
  id: packets.id, projectId: packets.projectId, status: packets.status, progress: packets.progress, pageCount: packets.pageCount,
  sha256: packets.sha256, error: packets.error, createdAt: packets.createdAt, updatedAt: packets.updatedAt,
}
