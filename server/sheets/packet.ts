import type { Db } from '../database/client'
import { shopName, type PacketPlan } from '../database/sheet-records'
import type { SessionUser } from '../utils/auth'
import { gapsInPeriod, loadCertifiedTests, loadRevocations, loadUses, type Gap } from './continuity-log'
import type { SheetModel } from './model'
import type { PacketDocumentInput, PacketEntry } from './packet-document'
import { renderBatch } from './packet-render'
import { mergePacket } from './packet-merge'
import { pageCountOf, storedSheetKey } from './stored'
import { putStoredFile, readStoredFile } from '../utils/storage'
import { continuityLogSheet, pqrSheetOf, procedureSheet, welderTestSheet } from './sheets'
import { todayIso } from '../utils/today'
import { jointRegisterSheet } from './packet-joints'

export { packetPlan, type PacketPlan } from '../database/sheet-records'

export function sheetCount(plan: PacketPlan) {
  return plan.procedureIds.length + plan.pqrIds.length + plan.welders.reduce((n, w) => n + w.testIds.length + 1, 0) + (plan.registerJoints ? 1 : 0)
}

export interface WelderGap extends Gap { welder: string, stamp: string }

/** Every welder of the project who was not current for a process of its WPSs on some day of the period. */
export async function gapsOfProject(db: Db, plan: PacketPlan): Promise<WelderGap[]> {
  const found: WelderGap[] = []
  for (const w of plan.welders) {
    const [tests, uses, revocations] = await Promise.all([loadCertifiedTests(db, w.id, plan.period.to), loadUses(db, w.id, plan.period.to), loadRevocations(db, w.id, plan.period.to)])
    for (const process of plan.processes) {
      for (const gap of gapsInPeriod(tests, uses, process, plan.period, revocations)) found.push({ ...gap, welder: w.name, stamp: w.stamp })
    }
  }
  return found
}

/** Sheets kept in file storage by content (stored.ts) when a packet needs them: the records' sheets, not the period's logs. */
const keptKinds = new Set<SheetModel['kind']>(['wps', 'pqr', 'wpq'])

/**
 * Builds the packet (progress 0..1): the sheets' models, then each record sheet's PDF from file storage (rendered once, at
 * signing or by the first packet that needs it, and kept under the SHA-256 of its model and layout), the period's
 * continuity logs and the weld register rendered fresh, the front (cover, index with each sheet's first packet page,
 * summary) rendered last, and all of it merged page after page with pdf-lib (packet-merge.ts).
 */
export async function buildPacket(db: Db, plan: PacketPlan, user: Pick<SessionUser, 'id' | 'name'>, origin: string, progress: (fraction: number) => Promise<void> | void) {
  const began = performance.now()
  const total = sheetCount(plan)
  const entries: PacketEntry[] = []
  let done = 0
  const add = async (sheet: SheetModel | null, group: string) => {
    if (sheet) entries.push({ sheet, group })
    done++
    await new Promise(resolve => setImmediate(resolve)) // let polling and other requests in between sheets
    if (done % 5 === 0 || done === total) await progress(0.4 * done / Math.max(total, 1))
  }
  for (const id of plan.procedureIds) await add(await procedureSheet(db, id, origin), 'Procedures')
  for (const id of plan.pqrIds) await add(await pqrSheetOf(db, id, origin), 'Procedure qualifications')
  for (const w of plan.welders) {
    for (const id of w.testIds) await add(await welderTestSheet(db, id, origin), `${w.name} (${w.stamp})`)
    await add(await continuityLogSheet(db, w.id, plan.period, user, origin), `${w.name} (${w.stamp})`)
  }
  await add(await jointRegisterSheet(db, plan, user, origin), 'Weld register')
  const modelsDone = performance.now()
  const gaps = await gapsOfProject(db, plan)
  const shop = await shopName(db)

  // Each sheet's page count: kept sheets are read from storage (their bytes are read again at the merge, one at a time).
  const keys = entries.map(e => (keptKinds.has(e.sheet.kind) ? storedSheetKey(e.sheet) : null))
  const pages: number[] = []
  const missing: number[] = []
  for (const [i, key] of keys.entries()) {
    const stored = key ? await readStoredFile(key) : null
    if (stored) pages[i] = pageCountOf(stored)
    else missing.push(i)
  }
  const fresh = new Map<number, Buffer>()
  const rendered = missing.length ? await renderBatch(missing.map(i => entries[i]!.sheet), null, f => progress(0.4 + 0.4 * f)) : []
  for (const [n, i] of missing.entries()) {
    const pdf = rendered[n]!.pdf
    pages[i] = pageCountOf(pdf)
    if (keys[i]) await putStoredFile(keys[i]!, pdf, 'application/pdf')
    else fresh.set(i, pdf)
  }
  const stored = performance.now()

  // The front is laid out with each sheet's first packet page; its own length is guessed, then checked.
  let frontPages = 2 + Math.ceil(entries.length / 40)
  let front: Buffer | null = null
  for (let attempt = 0; attempt < 4; attempt++) {
    let page = frontPages + 1
    const numbered = entries.map((e, i) => {
      const first = page
      page += pages[i]!
      return { ...e, page: first }
    })
    const input: PacketDocumentInput = { plan, shop, entries: numbered, gaps, preparedBy: user.name, preparedOn: todayIso() }
    const [out] = await renderBatch([], input)
    if (out!.pageCount === frontPages) {
      front = out!.pdf
      break
    }
    frontPages = out!.pageCount
  }
  if (!front) throw new Error('The packet index could not be laid out')
  await progress(0.85)
  async function* sheetPdfs() {
    for (const [i, key] of keys.entries()) {
      const pdf = key ? await readStoredFile(key) : fresh.get(i)
      if (!pdf) throw new Error(`Sheet ${i + 1} of the packet is missing from storage`)
      fresh.delete(i)
      yield new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength)
    }
  }
  const { pdf, pageCount } = await mergePacket(new Uint8Array(front.buffer, front.byteOffset, front.byteLength), sheetPdfs(), `Project ${plan.project.number}`)
  const timing = { modelsMs: Math.round(modelsDone - began), renderMs: Math.round(stored - modelsDone), mergeMs: Math.round(performance.now() - stored), rendered: missing.length }
  return { pdf: Buffer.from(pdf.buffer, pdf.byteOffset, pdf.byteLength), pageCount, sheets: entries.length, gaps: gaps.length, timing }
}
