import bcrypt from 'bcryptjs'
import { count } from 'drizzle-orm'
import { format, subDays } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { contentHash, currentContentFormat, newVerifyCode, type SignedRecordType } from '../signing'
import type { WelderTestInput } from '../../../shared/schemas/welder-test'
import { columnsOf, draftOf, type ProcedureRow } from '../procedure-columns'
import { pqrLayersOf } from '../pqr-columns'
import { columnsOf as welderTestColumns } from '../welder-test-columns'
import { seedDemoQualityA } from './demo-quality-a'
import { bendAcceptance } from '../../../shared/qualification/bend-acceptance'
import { tensileOf } from '../../../shared/qualification/tensile-acceptance'
import { seedDemoIso } from './demo-iso'
import { seedDemoTrials } from './demo-trials'
import {
  demoAccounts, demoBaseMetals, demoShopName, demoContinuity, demoCustomers, demoFillerMetals, demoPassword, demoPqrs, demoProcedures,
  demoProjects, demoWelders, demoWelderTests,
} from './demo-data'
import { seedStructuralDemo } from './demo-structural'
import { seedQualityB } from './demo-quality-b'
import { seedDemoWeldLog } from './demo-weld-log'

const day = (today: Date, daysAgo: number) => format(subDays(today, daysAgo), 'yyyy-MM-dd')

/** Seeds the demo shop into an empty database (no accounts yet). Returns false when there was data already. */
export async function seedDemoShop(db: Db, today = new Date()): Promise<boolean> {
  const [existing] = await db.select({ n: count() }).from(t.accounts)
  if ((existing?.n ?? 0) > 0) return false
  const passwordHash = await bcrypt.hash(demoPassword, 10)

  await db.transaction(async (tx) => {
    await tx.insert(t.shopSettings).values({ id: 1, name: demoShopName }).onConflictDoNothing()
    const welders = await tx.insert(t.welders).values(demoWelders.map(w => ({ ...w, status: 'status' in w ? w.status : 'active' }))).returning()
    const welderId = new Map(welders.map(w => [w.stamp, w.id]))
    const accounts = await tx.insert(t.accounts).values(demoAccounts.map(a => ({
      email: a.email, name: a.name, role: a.role, passwordHash,
      welderId: 'welderStamp' in a ? welderId.get(a.welderStamp) : null,
    }))).returning()
    const supervisor = accounts.find(a => a.role === 'supervisor')!
    const inspector = accounts.find(a => a.role === 'inspector')!

    const bases = await tx.insert(t.baseMetals).values([...demoBaseMetals]).returning()
    const fillers = await tx.insert(t.fillerMetals).values([...demoFillerMetals]).returning()
    const baseOf = ([spec, grade]: readonly [string, string]) => bases.find(b => b.specification === spec && b.grade === grade)!
    const fillerOf = ([spec, cls]: readonly [string, string]) => fillers.find(f => f.specification === spec && f.classification === cls)!

    const pqrId = new Map<string, number>()
    for (const p of demoPqrs) {
      const base = baseOf(p.base)
      const values = {
        number: p.number, testDate: day(today, p.daysAgo), code: p.code, edition: p.edition, unit: p.unit, process: p.process,
        transfer: p.transfer, couponThickness: p.couponThickness, depositThickness: p.depositThickness, baseMetalId: base.id,
        fillerMetalId: fillerOf(p.filler).id, actuals: p.actuals, labReportNumber: p.labReportNumber, status: p.status,
        baseMetalBId: 'baseB' in p ? baseOf(p.baseB).id : null, welderId: 'welder' in p ? welderId.get(p.welder)! : null,
        layers: 'layers' in p ? p.layers.map(({ filler, ...l }) => ({ ...l, fillerMetalId: fillerOf(filler).id })) : [],
      }
      // Every record as the app writes it: its layers and process list (a single-process PQR is one layer)
      const layers = pqrLayersOf(values)
      const [row] = await tx.insert(t.pqrs).values({ ...values, layers, processes: [...new Set(layers.map(l => l.process))] }).returning()
      pqrId.set(p.number, row!.id)
      await tx.insert(t.pqrTensileSpecimens).values(p.tensile.map((s) => {
        const result = tensileOf({ ...s, unit: p.unit, minimumStrength: base.minTensilePsi ?? 0 })
        return { ...s, pqrId: row!.id, strength: result.strength, accepted: result.accepted }
      }))
      await tx.insert(t.pqrBendSpecimens).values(p.bends.map(b => ({
        ...b, pqrId: row!.id, accepted: bendAcceptance(p.code, p.unit, [{ type: b.type, largestIndication: b.largestIndication }]).accepted,
      })))
    }

    const procedureId = new Map<string, number>()
    for (const p of demoProcedures) {
      const stored = {
        number: p.number, revision: p.revision, title: p.title, code: p.code, edition: p.edition, status: p.status, unit: p.unit,
        process: p.process, transfer: p.transfer, pNumberA: p.pNumbers[0], pNumberB: p.pNumbers[1],
        thicknessMin: p.thickness.min, thicknessMax: p.thickness.max, diameterMin: p.diameterMin, positions: [...p.positions],
        fNumbers: [...p.fNumbers], variables: p.variables, layers: 'layers' in p ? p.layers : [], processes: [],
      }
      // Written the way the app writes a draft: the variables read back as a draft (one layer for a single process), then as columns
      const draft = draftOf(stored as unknown as ProcedureRow, [])
      if ('groups' in p) {
        draft.baseMetals.a.groupNumber = p.groups[0]
        draft.baseMetals.b.groupNumber = p.groups[1]
      }
      const [row] = await tx.insert(t.procedures).values({
        ...columnsOf(draft), revision: p.revision, status: p.status, createdBy: supervisor.id,
        approvedAt: p.status === 'draft' ? null : subDays(today, 'layers' in p ? 120 : 400),
      }).returning()
      procedureId.set(`${p.number}@${p.revision}`, row!.id)
      await tx.insert(t.procedurePqrs).values(p.pqrs.map(n => ({ procedureId: row!.id, pqrId: pqrId.get(n)! })))
    }
    const latestProcedure = (number: string) => {
      const revisions = demoProcedures.filter(p => p.number === number).map(p => p.revision)
      return procedureId.get(`${number}@${Math.max(...revisions)}`)
    }

    const testIds: { id: number, status: string }[] = []
    for (const w of demoWelderTests) {
      const status = 'status' in w ? w.status : 'certified'
      // Written the way the app writes a test: the input as columns, with the ranges and bend verdicts of the rules
      const input: WelderTestInput = {
        welderId: welderId.get(w.stamp)!, procedureId: latestProcedure(w.wps) ?? null, pqrId: 'pqr' in w ? pqrId.get(w.pqr)! : null,
        testDate: day(today, w.daysAgo), code: 'asme-ix', edition: '2023', unit: 'in',
        processes: 'processes' in w ? w.processes.map(p => ({ ...p })) : [{ process: w.process, transfer: 'transfer' in w ? w.transfer : null, depositThickness: w.t, fNumber: null }],
        form: w.form, weld: w.weld, couponThickness: w.t, layers: w.t >= 0.5 ? 4 : 2, outsideDiameter: 'od' in w ? w.od : null, pNumber: '1', fNumber: w.f,
        backing: w.backing, positions: [...w.positions], progression: w.positions.some(p => ['3G', '5G', '6G', '3F'].includes(p)) ? 'uphill' : null,
        visualAccepted: true, visualNotes: null, examination: w.bends.length ? 'bend' : 'macro-fracture',
        bends: w.bends.map(([type, size]) => ({ type, largestIndication: size, atCorner: false })), radiography: null,
        macro: null, jointType: null, iso: null,
      }
      const { values, bends } = welderTestColumns(input)
      const [row] = await tx.insert(t.welderTests).values({
        ...values,
        status, inspectorId: inspector.id, certifiedAt: status === 'certified' ? subDays(today, w.daysAgo - 2) : null,
      }).returning()
      testIds.push({ id: row!.id, status })
      if (bends.length) await tx.insert(t.welderTestBends).values(bends.map(b => ({ ...b, testId: row!.id })))
    }

    const rows = demoContinuity.flatMap(c => c.daysAgo.map(d => ({
      welderId: welderId.get(c.stamp)!, process: c.process, weldedOn: day(today, d), reference: c.reference, recordedBy: inspector.id,
    })))
    await tx.insert(t.continuityEntries).values(rows)

    const customers = await tx.insert(t.customers).values([...demoCustomers]).returning()
    for (const p of demoProjects) {
      const [project] = await tx.insert(t.projects).values({
        number: p.number, name: p.name, customerId: customers.find(c => c.name === p.customer)!.id,
        startsOn: day(today, p.startDaysAgo), endsOn: p.endDaysAgo === null ? null : day(today, p.endDaysAgo),
      }).returning()
      await tx.insert(t.projectProcedures).values(p.procedures.map(k => ({ projectId: project!.id, procedureId: procedureId.get(k)! })))
      await tx.insert(t.projectWelders).values(p.welders.map(s => ({ projectId: project!.id, welderId: welderId.get(s)! })))
      for (const a of demoAccounts) {
        if ('grantedProject' in a && a.grantedProject === p.number) {
          await tx.insert(t.auditorGrants).values({ accountId: accounts.find(x => x.email === a.email)!.id, projectId: project!.id })
        }
      }
    }

    await seedStructuralDemo(tx as unknown as Db, { supervisorId: supervisor.id, inspectorId: inspector.id, welderId: welderId.get('KB-05')!, today })
    await seedDemoWeldLog(tx as unknown as Db, today)

    // Sign what the demo shows as approved or certified, over the content as stored.
    const toSign: { type: SignedRecordType, id: number, meaning: 'approved' | 'certified', signer: typeof supervisor }[] = [
      ...demoProcedures.filter(p => p.status !== 'draft').map(p => ({ type: 'procedure' as const, id: procedureId.get(`${p.number}@${p.revision}`)!, meaning: 'approved' as const, signer: supervisor })),
      ...demoPqrs.filter(p => p.status === 'certified').map(p => ({ type: 'pqr' as const, id: pqrId.get(p.number)!, meaning: 'certified' as const, signer: inspector })),
      ...testIds.filter(x => x.status === 'certified').map(x => ({ type: 'welder-test' as const, id: x.id, meaning: 'certified' as const, signer: inspector })),
    ]
    for (const s of toSign) {
      const sha256 = (await contentHash(tx as unknown as Db, s.type, s.id))!
      await tx.insert(t.signatures).values({
        recordType: s.type, recordId: s.id, recordVersion: 1, signerId: s.signer.id, signerName: s.signer.name,
        meaning: s.meaning, sha256, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
      })
    }
    await seedDemoIso(tx as unknown as Db, { today, supervisor, inspector })
    await seedDemoTrials(tx as unknown as Db, { supervisor: supervisor.id, inspector: inspector.id }, { baseId: baseOf(['SA-1011', 'CS Type B']).id, fillerId: fillerOf(['SFA-5.18', 'ER70S-6']).id })
    await seedDemoQualityA(tx as unknown as Db, today, inspector)
    await seedQualityB(tx as unknown as Db, today)
    await tx.insert(t.auditEvents).values({ accountId: null, action: 'seed', recordType: 'shop', after: { shop: 'demo' } })
  })
  return true
}
