import { and, asc, eq, inArray, lte } from 'drizzle-orm'
import type { Db } from '../database/client'
import { customers, procedures, projectProcedures, projectWelders, projects, welders, welderTests } from '../database/schema'
import type { SessionUser } from '../utils/auth'
import { gapsInPeriod, loadCertifiedTests, loadUses, type Gap, type Period } from './continuity'
import type { SheetModel } from './model'
import type { PacketDocumentInput, PacketEntry } from './packet-document'
import { renderPacket } from './packet-render'
import { pqrIdsOf, shopName } from './records'
import { continuityLogSheet, pqrSheetOf, procedureSheet, projectPeriod, welderTestSheet } from './sheets'
import { todayIso } from '../utils/today'
import { jointRegisterSheet } from './packet-joints'
import { jointCountOf } from '../database/joints'

export interface PacketPlan {
  project: { id: number, number: string, name: string, customer: string }
  period: Period
  procedureIds: number[]
  pqrIds: number[]
  pqrs: { id: number, number: string }[]
  welders: { id: number, name: string, stamp: string, testIds: number[], tests: { id: number, process: string, testDate: string }[] }[]
  processes: string[]
  /** Joints in the project's weld register (the packet prints the register when there are any) */
  registerJoints: number
}

/** What goes into a project's packet: its WPSs and their PQRs, its welders' certified tests up to the period's end. */
export async function packetPlan(db: Db, projectId: number): Promise<PacketPlan | null> {
  const [project] = await db.select({ id: projects.id, number: projects.number, name: projects.name, customer: customers.name })
    .from(projects).innerJoin(customers, eq(customers.id, projects.customerId)).where(eq(projects.id, projectId))
  const period = await projectPeriod(db, projectId)
  if (!project || !period) return null
  const procs = await db.select({ id: procedures.id, process: procedures.process, processes: procedures.processes }).from(projectProcedures)
    .innerJoin(procedures, eq(procedures.id, projectProcedures.procedureId)).where(eq(projectProcedures.projectId, projectId))
    .orderBy(asc(procedures.number), asc(procedures.revision))
  const support = await pqrIdsOf(db, procs.map(p => p.id))
  const crew = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(projectWelders)
    .innerJoin(welders, eq(welders.id, projectWelders.welderId)).where(eq(projectWelders.projectId, projectId)).orderBy(asc(welders.stamp))
  const tests = crew.length
    ? await db.select({ id: welderTests.id, welderId: welderTests.welderId, process: welderTests.process, testDate: welderTests.testDate }).from(welderTests)
        .where(and(inArray(welderTests.welderId, crew.map(w => w.id)), eq(welderTests.status, 'certified'), lte(welderTests.testDate, period.to)))
        .orderBy(asc(welderTests.testDate), asc(welderTests.id))
    : []
  return {
    project, period,
    procedureIds: procs.map(p => p.id),
    pqrIds: [...new Set(support.map(s => s.pqrId))],
    welders: crew.map((w) => {
      const own = tests.filter(t => t.welderId === w.id).map(t => ({ id: t.id, process: t.process, testDate: t.testDate }))
      return { ...w, testIds: own.map(t => t.id), tests: own }
    }),
    pqrs: [...new Map(support.map(s => [s.pqrId, { id: s.pqrId, number: s.number }])).values()],
    // Every process of every layer of the project's WPSs (a GTAW root, SMAW fill WPS needs both held).
    processes: [...new Set(procs.flatMap(p => (p.processes?.length ? p.processes : [p.process])))].sort(),
    registerJoints: await jointCountOf(db, projectId),
  }
}

export function sheetCount(plan: PacketPlan) {
  return plan.procedureIds.length + plan.pqrIds.length + plan.welders.reduce((n, w) => n + w.testIds.length + 1, 0) + (plan.registerJoints ? 1 : 0)
}

export interface WelderGap extends Gap { welder: string, stamp: string }

/** Every welder of the project who was not current for a process of its WPSs on some day of the period. */
export async function gapsOfProject(db: Db, plan: PacketPlan): Promise<WelderGap[]> {
  const found: WelderGap[] = []
  for (const w of plan.welders) {
    const [tests, uses] = await Promise.all([loadCertifiedTests(db, w.id, plan.period.to), loadUses(db, w.id, plan.period.to)])
    for (const process of plan.processes) {
      for (const gap of gapsInPeriod(tests, uses, process, plan.period)) found.push({ ...gap, welder: w.name, stamp: w.stamp })
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
