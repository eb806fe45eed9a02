import { addMonths, format, subDays, subMonths } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { canonicalJson, contentHash, currentContentFormat, newVerifyCode, sha256Hex } from '../signing'
import { columnsOf } from '../welder-test-columns'
import { eq } from 'drizzle-orm'
import { pqrColumns } from '../pqr-columns'
import { columnsOf as procedureColumns } from '../procedure-columns'
import { bendAcceptance } from '../../../shared/qualification/bend-acceptance'
import { tensileOf } from '../../../shared/qualification/tensile-acceptance'
import { psiToMpa, blankPqrLayer, pqrDraftSchema } from '../../../shared/schemas/pqr'
import { blankLayer, blankProcedureDraft, procedureDraftSchema } from '../../../shared/schemas/procedure'
import type { WelderTestInput } from '../../../shared/schemas/welder-test'

// The demo shop's ISO side (invented): a welder certified to ISO 9606-1 for 135 P BW FM1 S t10 PF ss nb, route 9.3 b),
// tested 22 months ago, confirmed every five months by the welding coordinator, with two production welds tested in the
// last six months of the first two years (so the certificate runs two more years). And an ISO 15614-1 WPQR, 135 spray on
// 15 mm plate in PA with impact tests, values in mm and °C, with the ISO 15609-1 WPS it supports.
const iso = (d: Date) => format(d, 'yyyy-MM-dd')

export async function seedDemoIso(tx: Db, ctx: { today: Date, supervisor: { id: number, name: string }, inspector: { id: number, name: string } }) {
  const { today, supervisor, inspector } = ctx
  await seedDemoIsoWpqr(tx, today, inspector, supervisor)
  const [welder] = await tx.insert(t.welders).values({ name: 'Oda Varga', stamp: 'KB-13', employeeNumber: 'E-2107', status: 'active' }).returning()
  const tested = subMonths(today, 22)
  const input: WelderTestInput = {
    welderId: welder!.id, procedureId: null, pqrId: null, testDate: iso(tested), code: 'iso-9606-1', edition: '2017', unit: 'mm',
    processes: [{ process: '135', transfer: 'short-circuit', depositThickness: null, fNumber: null }],
    form: 'plate', weld: 'groove', couponThickness: 10, layers: 4, outsideDiameter: null, pNumber: null, fNumber: '1', backing: false,
    positions: ['PF'], progression: null, visualAccepted: true, visualNotes: null, examination: 'bend',
    bends: [{ type: 'root', largestIndication: 0, atCorner: false }, { type: 'root', largestIndication: 0, atCorner: false }, { type: 'face', largestIndication: 0.5, atCorner: false }, { type: 'face', largestIndication: 0, atCorner: false }],
    radiography: null, macro: null, jointType: null,
    iso: { fillerType: 'S', details: 'ss nb', gouging: null, examiner: 'Tomasz Lind', examiningBody: 'Nordkreis Weld Examinations', testMethods: ['VT', 'BT'], welderIdentification: 'Works pass 2107', route: 'b' },
  }
  const { values, bends } = columnsOf(input)
  const [row] = await tx.insert(t.welderTests).values({ ...values, status: 'certified', inspectorId: inspector.id, certifiedAt: subDays(tested, -2) }).returning()
  if (bends.length) await tx.insert(t.welderTestBends).values(bends.map(b => ({ ...b, testId: row!.id })))
  const sha256 = (await contentHash(tx, 'welder-test', row!.id))!
  await tx.insert(t.signatures).values({
    recordType: 'welder-test', recordId: row!.id, recordVersion: 1, signerId: inspector.id, signerName: inspector.name,
    meaning: 'certified', sha256, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
  })
  const records = [
    ...[5, 10, 15, 20].map(m => ({ kind: 'confirmation', on: iso(addMonths(tested, m)), confirmer: 'coordinator', statement: 'Worked with 135 on plate butt welds in PF and PA within the range of qualification; no reason to question competence.', reference: null as string | null })),
    { kind: 'production-welds', on: iso(addMonths(tested, 21)), confirmer: 'examiner', statement: 'Two production butt welds by this welder tested by radiography and accepted.', reference: 'Welds C-114 and C-117, report RT-5530' },
  ]
  for (const r of records) {
    const signer = r.confirmer === 'examiner' ? inspector : supervisor
    const content = { testId: row!.id, kind: r.kind, on: r.on, confirmer: r.confirmer, statement: r.statement, reference: r.reference, signerName: signer.name }
    await tx.insert(t.isoValidityRecords).values({ ...content, signerId: signer.id, sha256: sha256Hex(canonicalJson(content)) })
  }
}

/**
 * The demo's ISO 15614-1:2017 WPQR, certified: 135 on 15 mm plate (group 1.2) in PA with impact tests, values in mm and °C;
 * and an ISO 15609-1 WPS drafted from it (135, 8 to 30 mm, PA and PF), which the WPQR supports on every variable compared.
 */
export async function seedDemoIsoWpqr(tx: Db, today: Date, inspector: { id: number, name: string }, supervisor: { id: number, name: string }) {
  const [base] = await tx.select().from(t.baseMetals).where(eq(t.baseMetals.specification, 'SA-516')).limit(1)
  const [filler] = await tx.select().from(t.fillerMetals).where(eq(t.fillerMetals.classification, 'ER70S-6')).limit(1)
  const layer = { ...blankPqrLayer('135', 'all passes'), transfer: 'spray' as const, fillerMetalId: filler!.id, fillerSize: 1.2, depositThickness: 15, current: 'DCEP' as const, amps: 265, volts: 28.5, wireFeed: 9.5, travelSpeed: 320, heatInput: 1400, gas: 'ISO 14175-M21 (82Ar-18CO2)', gasFlow: 16 }
  const draft = pqrDraftSchema.parse({
    number: 'WPQR-ISO-07', testDate: iso(subMonths(today, 5)), code: 'iso-15614-1', edition: '2017', unit: 'mm', couponThickness: 15,
    baseMetalId: base!.id, baseMetalBId: null, welderId: null, toughnessRequired: true, labReportNumber: 'NK-WP-3318', layers: [layer],
    actuals: {
      preheat: 20, interpass: 200, pwht: 'none',
      iso: { positions: ['PA'], form: 'plate', outsideDiameter: null, runs: 'multi', materialGroup: '1.2', fillerDesignation: 'ISO 14341-A G 42 4 M21 3Si1', fillerGroup: '1', hardnessTested: false },
    },
  })
  const toughness = { testTemperature: -20, specimens: [64, 58, 61].map(energy => ({ location: 'weld metal', energy })) }
  const [row] = await tx.insert(t.pqrs).values({ ...pqrColumns(draft), status: 'certified', toughness }).returning()
  // Judged as the app judges an ISO WPQR's results (server/database/pqrs.ts judgedResults: the ISO tensile and bend rules, MPa)
  const minimum = psiToMpa(base!.minTensilePsi ?? 0)
  const tensile = [{ label: 'T1', width: 25, thickness: 15, load: 198000, breakLocation: 'base metal' }, { label: 'T2', width: 25, thickness: 15, load: 196500, breakLocation: 'base metal' }]
  await tx.insert(t.pqrTensileSpecimens).values(tensile.map((s) => {
    const judged = tensileOf({ ...s, unit: 'mm', minimumStrength: minimum, code: 'iso-9606-1' })
    return { ...s, pqrId: row!.id, strength: judged.strength, accepted: judged.accepted }
  }))
  const bends = [0, 0, 1, 0].map(size => ({ type: 'side', largestIndication: size, atCorner: false }))
  await tx.insert(t.pqrBendSpecimens).values(bends.map(b => ({ ...b, pqrId: row!.id, accepted: bendAcceptance('iso-9606-1', 'mm', [b]).accepted })))
  await tx.insert(t.signatures).values({
    recordType: 'pqr', recordId: row!.id, recordVersion: 1, signerId: inspector.id, signerName: inspector.name,
    meaning: 'certified', sha256: (await contentHash(tx, 'pqr', row!.id))!, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
  })

  const wps = procedureDraftSchema.parse({
    ...blankProcedureDraft(), number: 'KB-ISO-135-01', title: 'MAG 135 butt welds in plate, group 1.2, 8 to 30 mm', code: 'iso-15614-1', edition: '2017', unit: 'mm',
    baseMetals: { a: { baseMetalId: base!.id, pNumber: '1.2', groupNumber: null }, b: { baseMetalId: base!.id, pNumber: '1.2', groupNumber: null } },
    thickness: { groove: { min: 8, max: 30 }, fillet: { min: null, max: null } }, diameter: { min: null, max: null },
    joints: { type: 'butt', groove: 'single V, 60°, root face 1 mm', grooveAngle: 60, rootOpening: { min: 1, max: 2 }, rootFace: { min: 0, max: 1 }, backing: 'none (single side, root welded from one side)', designation: null },
    positions: ['PA', 'PF'], progression: null, toughnessRequired: true, preheatMin: 20, interpassMax: 200,
    pwht: { required: false, temperature: { min: null, max: null }, holdHours: null, note: 'as welded' },
    layers: [{
      ...blankLayer('GMAW', 'all passes'), process: '135', transfer: 'spray',
      fillers: [{ fillerMetalId: null, specification: 'ISO 14341-A', classification: 'G 42 4 M21 3Si1', fNumber: 'FM1', aNumber: null, size: 1.2 }],
      amps: { min: 240, max: 285, setPoint: 265 }, volts: { min: 27, max: 30, setPoint: 28.5 }, travelSpeed: { min: 280, max: 360, setPoint: 320 },
      heatInputMax: 1700, gas: { composition: 'ISO 14175-M21 (82Ar-18CO2)', flow: { min: 14, max: 18, setPoint: 16 } },
    }],
  })
  const [procedure] = await tx.insert(t.procedures).values({ ...procedureColumns(wps), revision: 0, status: 'draft', createdBy: supervisor.id }).returning()
  await tx.insert(t.procedurePqrs).values({ procedureId: procedure!.id, pqrId: row!.id })
}
