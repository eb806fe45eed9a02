import { createHash } from 'node:crypto'
import type { Db } from '../database/client'
import { createPacket, packetBuilding, packetFailed, packetReady } from '../database/packets'
import { appendicesOf } from '../database/sheet-records'
import { appendFiles } from './appendices'
import type { SessionUser } from '../utils/auth'
import { buildPacket, packetPlan } from './packet'

/**
 * Starts a packet build in this process and returns at once with the queued row. Progress and the result are kept
 * in the database, so any app server can answer the polling and hand out the file.
 */
export async function startPacket(db: Db, projectId: number, user: SessionUser, origin: string) {
  const row = await createPacket(db, projectId, user)
  void runPacket(db, row.id, projectId, user, origin)
  return row
}

async function runPacket(db: Db, packetId: number, projectId: number, user: SessionUser, origin: string) {
  let last = -1
  const progress = async (fraction: number) => {
    const percent = Math.min(99, Math.floor(fraction * 100))
    if (percent < last + 3) return // a write every few percent is enough for a progress bar
    last = percent
    await packetBuilding(db, packetId, percent)
  }
  try {
    await packetBuilding(db, packetId)
    const plan = await packetPlan(db, projectId)
    if (!plan) throw new Error('The project no longer exists')
    const built = await buildPacket(db, plan, user, origin, progress)
    const { sheets, timing } = built
    // Attached files (lab and radiography reports, sketches, photos) follow the sheets as appendices.
    const files = await appendicesOf(db, plan)
    const { pdf, pageCount } = files.length ? await appendFiles(new Uint8Array(built.pdf), files) : built
    console.info(`[rootface] packet ${packetId}: ${sheets} sheets, ${pageCount} pages; sheets read in ${timing.modelsMs} ms, ${timing.rendered} rendered in ${timing.renderMs} ms, merged in ${timing.mergeMs} ms`)
    const sha256 = createHash('sha256').update(pdf).digest('hex')
    await packetReady(db, packetId, new Uint8Array(pdf), pageCount, sha256)
  }
  catch (error) {
    console.error(`[rootface] packet ${packetId} failed`, error)
    await packetFailed(db, packetId, error instanceof Error ? error.message : String(error)).catch(() => {})
  }
}
