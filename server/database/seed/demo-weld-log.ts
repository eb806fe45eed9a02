import { and, eq } from 'drizzle-orm'
import { format, subDays } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { checkAssignment } from '../joints'
import type { JointWelderInput } from '../../../shared/schemas/joints'
import type { JointCheck } from '../../../shared/qualification/joint-check'

/**
 * The demo projects' weld registers (invented): vessel seams and nozzles, pipe-rack tie-ins and duct panels. Each welded
 * joint takes the continuity entry already logged for that welder, process and day, so the demo's standings stay as they
 * were; the check on the weld date is run and kept as the app keeps it. One vessel seam has a rejected RT and an R1 repair.
 */
type Crew = [stamp: string, process: string, layer: JointWelderInput['layer'], fNumber: number]
interface DemoJoint {
  mark: string
  jointType: string
  weld: 'groove' | 'fillet'
  pNumbers: [string, string]
  thickness: number
  od: number | null
  positions: string[]
  progression?: 'uphill'
  rt: number
  wps: string
  crew: Crew[]
  daysAgo: number | null
}

const vessel: DemoJoint[] = [
  { mark: 'V204-C1', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.5, od: 48, positions: ['F'], rt: 100, wps: 'KB-W02@1', crew: [['KB-04', 'SMAW', 'all', 4]], daysAgo: 180 },
  { mark: 'V204-L1', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.5, od: 48, positions: ['F'], rt: 100, wps: 'KB-W02@1', crew: [['KB-10', 'SMAW', 'all', 4]], daysAgo: 150 },
  { mark: 'V204-C2', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.5, od: 48, positions: ['F'], rt: 100, wps: 'KB-W02@1', crew: [['KB-04', 'SMAW', 'all', 4]], daysAgo: 100 },
  { mark: 'V204-S1', jointType: 'tee', weld: 'fillet', pNumbers: ['1', '1'], thickness: 0.375, od: null, positions: ['F', 'H'], rt: 0, wps: 'KB-W02@1', crew: [['KB-04', 'SMAW', 'all', 4]], daysAgo: 240 },
  { mark: 'V204-C3', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.5, od: 48, positions: ['F'], rt: 100, wps: 'KB-W02@1', crew: [['KB-04', 'SMAW', 'all', 4]], daysAgo: 30 },
  { mark: 'V204-D1', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.218, od: 2.375, positions: ['F'], rt: 10, wps: 'KB-W03@0', crew: [['KB-07', 'GTAW', 'all', 6]], daysAgo: 14 },
  { mark: 'V204-S2', jointType: 'tee', weld: 'fillet', pNumbers: ['1', '1'], thickness: 0.375, od: null, positions: ['F', 'H'], rt: 0, wps: 'KB-W02@1', crew: [['KB-03', 'SMAW', 'all', 4]], daysAgo: 172 },
  { mark: 'V204-C4', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.5, od: 48, positions: ['F'], rt: 100, wps: 'KB-W02@1', crew: [['KB-04', 'SMAW', 'all', 4]], daysAgo: null },
]
const rack: DemoJoint[] = [
  { mark: 'L12-W01', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.218, od: 2.375, positions: ['F', 'V', 'O'], progression: 'uphill', rt: 5, wps: 'KB-W03@0', crew: [['KB-05', 'GTAW', 'all', 6]], daysAgo: 225 },
  { mark: 'L12-W02', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.218, od: 2.375, positions: ['F', 'V', 'O'], progression: 'uphill', rt: 5, wps: 'KB-W03@0', crew: [['KB-05', 'GTAW', 'all', 6]], daysAgo: 190 },
  { mark: 'L12-W03', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.218, od: 2.375, positions: ['F', 'V', 'O'], progression: 'uphill', rt: 5, wps: 'KB-W03@0', crew: [['KB-05', 'GTAW', 'all', 6]], daysAgo: 168 },
  // Welded by a welder whose GTAW had lapsed: let through afterwards with a written reason (printed in the packet)
  { mark: 'L12-W04', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.337, od: 4.5, positions: ['F', 'V', 'O'], progression: 'uphill', rt: 100, wps: 'KB-W03@0', crew: [['KB-10', 'GTAW', 'all', 6]], daysAgo: 214 },
]
const hoods: DemoJoint[] = [
  { mark: 'H3-P01', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.1046, od: null, positions: ['F', 'V'], progression: 'uphill', rt: 0, wps: 'KB-W01@0', crew: [['KB-03', 'GMAW', 'all', 6]], daysAgo: 45 },
  { mark: 'H3-B02', jointType: 'tee', weld: 'fillet', pNumbers: ['1', '1'], thickness: 0.1345, od: null, positions: ['F', 'H'], rt: 0, wps: 'KB-W01@0', crew: [['KB-05', 'GMAW', 'all', 6]], daysAgo: 66 },
  { mark: 'H3-P03', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.0747, od: null, positions: ['F'], rt: 0, wps: 'KB-W01@0', crew: [['KB-02', 'GMAW', 'all', 6]], daysAgo: 12 },
  { mark: 'H3-D04', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.0747, od: null, positions: ['F'], rt: 0, wps: 'KB-W01@0', crew: [['KB-09', 'GMAW', 'all', 6]], daysAgo: 3 },
  { mark: 'H3-D05', jointType: 'butt', weld: 'groove', pNumbers: ['1', '1'], thickness: 0.0747, od: null, positions: ['F'], rt: 0, wps: 'KB-W01@0', crew: [['KB-09', 'GMAW', 'all', 6]], daysAgo: null },
]
export const demoRegisters: Record<string, DemoJoint[]> = { 'KB-2611': vessel, 'KB-2598': rack, 'KB-2615': hoods }

const day = (today: Date, daysAgo: number) => format(subDays(today, daysAgo), 'yyyy-MM-dd')

export async function seedDemoWeldLog(db: Db, today: Date) {
  const [inspector] = await db.select().from(t.accounts).where(eq(t.accounts.role, 'inspector')).limit(1)
  const [supervisor] = await db.select().from(t.accounts).where(eq(t.accounts.role, 'supervisor')).limit(1)
  const roster = await db.select({ id: t.welders.id, stamp: t.welders.stamp }).from(t.welders)
  const procs = await db.select({ id: t.procedures.id, number: t.procedures.number, revision: t.procedures.revision }).from(t.procedures)
  const welderId = (stamp: string) => roster.find(w => w.stamp === stamp)!.id
  const procedureId = (key: string) => procs.find(p => `${p.number}@${p.revision}` === key)!.id

  const checks = new Map<string, JointCheck>()
  for (const [number, register] of Object.entries(demoRegisters)) {
    const [project] = await db.select({ id: t.projects.id }).from(t.projects).where(eq(t.projects.number, number))
    if (!project) continue
    for (const j of register) {
      const crew: JointWelderInput[] = j.crew.map(([stamp, process, layer, fNumber]) => ({ welderId: welderId(stamp), process: process as JointWelderInput['process'], layer, fNumber }))
      const weldedOn = j.daysAgo === null ? null : day(today, j.daysAgo)
      const joint = {
        unit: 'in' as const, weld: j.weld, pNumberA: j.pNumbers[0], pNumberB: j.pNumbers[1], thickness: j.thickness, outsideDiameter: j.od,
        positions: j.positions, progression: j.progression ?? null, backing: j.weld === 'fillet' ? null : j.od !== null && j.od >= 24,
      }
      const check = weldedOn ? await checkAssignment(db, joint, procedureId(j.wps), crew, weldedOn) : null
      if (check) checks.set(j.mark, check)
      const [row] = await db.insert(t.joints).values({
        ...joint, projectId: project.id, mark: j.mark, jointType: j.jointType, rtPercent: j.rt, procedureId: procedureId(j.wps), weldedOn,
        completionCheck: check ? check.findings.filter(f => f.subject === 'welder').map(f => ({ welderId: f.welderId, stamp: f.stamp, process: f.process, answer: f.answer, lapsesOn: f.lapsesOn ?? null })) : null,
        createdBy: supervisor!.id,
      }).returning()
      await db.insert(t.jointWelders).values(crew.map(c => ({ ...c, jointId: row!.id, repair: 0 })))
      if (!weldedOn) continue
      for (const c of crew) {
        await db.update(t.continuityEntries).set({ jointId: row!.id })
          .where(and(eq(t.continuityEntries.welderId, c.welderId), eq(t.continuityEntries.process, c.process), eq(t.continuityEntries.weldedOn, weldedOn)))
      }
      await db.insert(t.jointExaminations).values({ jointId: row!.id, method: 'VT', reportNumber: `VT-${j.mark}`, examinedOn: weldedOn, accepted: true, recordedBy: inspector!.id })
    }
  }

  // The vessel's fourth circumferential seam: RT rejected for slag, repaired (R1) by another welder, RT accepted.
  const [c3] = await db.select().from(t.joints).where(eq(t.joints.mark, 'V204-C3'))
  if (c3?.weldedOn) {
    await db.insert(t.jointExaminations).values({
      jointId: c3.id, method: 'RT', reportNumber: 'RT-26-0311', examinedOn: day(today, 28), accepted: false, lengthExamined: 150.8,
      defectType: 'slag', defectLength: 0.75, recordedBy: inspector!.id,
    })
    await db.insert(t.jointRepairs).values({ jointId: c3.id, repair: 1, cause: 'RT-26-0311: slag inclusion 3/4 in at 2 o\'clock, excavate and reweld', weldedOn: day(today, 20) })
    await db.insert(t.jointWelders).values({ jointId: c3.id, welderId: welderId('KB-10'), process: 'SMAW', layer: 'all', fNumber: 4, repair: 1 })
    await db.update(t.continuityEntries).set({ jointId: c3.id })
      .where(and(eq(t.continuityEntries.welderId, welderId('KB-10')), eq(t.continuityEntries.process, 'SMAW'), eq(t.continuityEntries.weldedOn, day(today, 20))))
    await db.insert(t.jointExaminations).values({
      jointId: c3.id, repair: 1, method: 'RT', reportNumber: 'RT-26-0318', examinedOn: day(today, 18), accepted: true, lengthExamined: 12, recordedBy: inspector!.id,
    })
  }
  const [w04] = await db.select().from(t.joints).where(eq(t.joints.mark, 'L12-W04'))
  if (w04?.weldedOn) {
    await db.insert(t.jointExaminations).values({ jointId: w04.id, method: 'RT', reportNumber: 'RT-26-0144', examinedOn: w04.weldedOn, accepted: true, lengthExamined: 14.1, recordedBy: inspector!.id })
    await db.insert(t.jointOverrides).values({
      jointId: w04.id, stage: 'completion', accountId: supervisor!.id, accountName: supervisor!.name,
      reason: 'KB-10 GTAW lapse found after the tie-in was welded; joint 100% RT acceptable (RT-26-0144), NCR-0412 raised, renewal coupon booked.',
      refusals: checks.get('L12-W04')?.refusals ?? [],
    })
  }
  const rtAccepted = ['V204-C1', 'V204-L1', 'V204-C2']
  for (const mark of rtAccepted) {
    const [j] = await db.select().from(t.joints).where(eq(t.joints.mark, mark))
    if (j?.weldedOn) {
      await db.insert(t.jointExaminations).values({ jointId: j.id, method: 'RT', reportNumber: `RT-26-0${200 + j.id}`, examinedOn: j.weldedOn, accepted: true, lengthExamined: 150.8, recordedBy: inspector!.id })
    }
  }
}
