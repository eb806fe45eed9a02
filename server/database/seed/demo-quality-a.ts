import { and, eq } from 'drizzle-orm'
import { format, subDays } from 'date-fns'
import type { Db } from '../client'
import * as t from '../schema'
import { contentHash, currentContentFormat, newVerifyCode } from '../signing'
import { columnsOf } from '../welder-test-columns'
import type { WelderTestInput } from '../../../shared/schemas/welder-test'

// The demo's revoked qualification and its welding operator (invented): KB-09's GMAW is revoked for a specific reason,
// and KB-08 is qualified as a machine SAW welding operator.
const day = (today: Date, daysAgo: number) => format(subDays(today, daysAgo), 'yyyy-MM-dd')

export async function seedDemoQualityA(tx: Db, today: Date, inspector: { id: number, name: string }) {
  const stampId = async (stamp: string) => (await tx.select({ id: t.welders.id }).from(t.welders).where(eq(t.welders.stamp, stamp)))[0]?.id
  const revokedWelder = await stampId('KB-09')
  const operatorWelder = await stampId('KB-08')
  if (!revokedWelder || !operatorWelder) return

  const [basis] = await tx.select({ id: t.welderTests.id }).from(t.welderTests)
    .where(and(eq(t.welderTests.welderId, revokedWelder), eq(t.welderTests.process, 'GMAW'), eq(t.welderTests.status, 'certified')))
  await tx.insert(t.qualificationRevocations).values({
    welderId: revokedWelder, process: 'GMAW', revokedOn: day(today, 10), basisTestId: basis?.id ?? null, revokedBy: inspector.id,
    reason: 'Lack of fusion found at the toe of three access-door frame welds on the line 3 hood job; retest before further short-circuit work',
  })

  const input: WelderTestInput = {
    welderId: operatorWelder, procedureId: null, pqrId: null, testDate: day(today, 40), code: 'asme-ix', edition: '2023', unit: 'in',
    processes: [{ process: 'SAW', transfer: null, depositThickness: 0.75, fNumber: null }], form: 'plate', weld: 'groove', couponThickness: 0.75,
    layers: 3, outsideDiameter: null, pNumber: '1', fNumber: '6', backing: true, positions: ['1G'], progression: null, visualAccepted: true,
    visualNotes: null, examination: 'bend', bends: [{ type: 'side', largestIndication: 0, atCorner: false }, { type: 'side', largestIndication: 0.02, atCorner: false }],
    radiography: null, macro: null, jointType: null, iso: null, qualifiedAs: 'welding-operator',
    operator: { mode: 'machine', visualControl: 'direct', arcVoltageControl: false, jointTracking: true, consumableInserts: false, passesPerSide: 'multiple' },
  }
  const { values, bends } = columnsOf(input)
  const [row] = await tx.insert(t.welderTests).values({ ...values, status: 'certified', inspectorId: inspector.id, certifiedAt: subDays(today, 38) }).returning()
  await tx.insert(t.welderTestBends).values(bends.map(b => ({ ...b, testId: row!.id })))
  await tx.insert(t.signatures).values({
    recordType: 'welder-test', recordId: row!.id, recordVersion: 1, signerId: inspector.id, signerName: inspector.name,
    meaning: 'certified', sha256: (await contentHash(tx, 'welder-test', row!.id))!, verifyCode: newVerifyCode(), contentFormat: currentContentFormat,
  })
}
