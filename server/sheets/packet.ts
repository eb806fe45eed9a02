import type { Db } from '../database/client'
import { shopName, type PacketPlan } from '../database/sheet-records'
import type { SessionUser } from '../utils/auth'
import { gapsInPeriod, loadCertifiedTests, loadRevocations, loadUses, type Gap } from './continuity-log'
import type { SheetModel } from './model'
import type { PacketDocumentInput, PacketEntry } from './packet-document'
import { renderPacket } from './packet-render'
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

/** Builds the packet's sheets (0..0.6 of the progress) and renders the one PDF (0.6..1). */
export async function buildPacket(db: Db, plan: PacketPlan, user: Pick<SessionUser, 'id' | 'name'>, origin: string, progress: (fraction: number) => Promise<void> | void) {
  const began = performance.now()
  const total = sheetCount(plan)
  const entries: PacketEntry[] = []
  let done = 0
  const add = async (sheet: SheetModel | null, group: string) => {
    if (sheet) entries.push({ sheet, group })
    done++
    await new Promise(resolve => setImmediate(resolve)) // let polling and other requests in between sheets
    if (done % 5 === 0 || done === total) await progress(0.6 * done / Math.max(total, 1))
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
  const input: PacketDocumentInput = { plan, shop, entries, gaps, preparedBy: user.name, preparedOn: todayIso() }
  const { pdf, pageCount } = await renderPacket(input, f => progress(0.6 + 0.4 * f))
  const timing = { modelsMs: Math.round(modelsDone - began), renderMs: Math.round(performance.now() - modelsDone) }
  return { pdf, pageCount, sheets: entries.length, gaps: gaps.length, timing }
}
