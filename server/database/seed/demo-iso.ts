import { addMonths, format, subDays, subMonths } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { canonicalJson, contentHash, currentContentFormat, newVerifyCode, sha256Hex } from '../signing'
import { columnsOf } from '../welder-test-columns'
import { pqrLayersOf } from '../pqr-columns'
import type { WelderTestInput } from '../../../shared/schemas/welder-test'

// The demo shop's ISO side (invented): a welder certified to ISO 9606-1 for 135 P BW FM1 S t10 PF ss nb, route 9.3 b),
// tested 22 months ago, confirmed every five months by the welding coordinator, with two production welds tested in the
// last six months of the first two years (so the certificate runs two more years). And an ISO 15614-1 WPQR (recorded
// under the ISO code; read as ISO 15614-1), 135 spray on 15 mm plate in PA with impact tests, values in mm and °C.
const iso = (d: Date) => format(d, 'yyyy-MM-dd')

export async function seedDemoIso(tx: Db, ctx: { today: Date, supervisor: { id: number, name: string }, inspector: { id: number, name: string } }) {
  const { today, supervisor, inspector } = ctx
  await seedDemoIsoWpqr(tx, today)
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

/** The demo's ISO 15614-1 WPQR, recorded (not yet certified): a draft WPS can be written from it. */
export async function seedDemoIsoWpqr(tx: Db, today: Date) {
  const [base] = await tx.select().from(t.baseMetals).limit(1)
  const [filler] = await tx.select().from(t.fillerMetals).limit(1)
  const values = {
    number: 'WPQR-ISO-07', testDate: iso(subMonths(today, 5)), code: 'iso-9606-1', edition: '2017', unit: 'mm', process: 'GMAW', transfer: 'spray',
    couponThickness: 15, depositThickness: 15, baseMetalId: base!.id, fillerMetalId: filler!.id, toughnessRequired: true,
    actuals: { amps: 265, volts: 28.5, wireFeed: 9.5, travelSpeed: 320, gas: 'M21 (82Ar-18CO2)', gasFlow: 16, position: 'PA', preheat: 20, interpass: 200 },
    labReportNumber: 'NK-WP-3318', status: 'recorded', layers: [] as unknown[],
  }
  const layers = pqrLayersOf(values as Parameters<typeof pqrLayersOf>[0])
  await tx.insert(t.pqrs).values({ ...values, layers, processes: [...new Set(layers.map(l => l.process))] })
}
