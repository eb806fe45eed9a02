import { randomBytes } from 'node:crypto'
import { format, subDays, subMonths } from 'date-fns'
import { eq } from 'drizzle-orm'
import type { Db } from '../client'
import * as t from '../schema'

// The demo shop's machines and meters (invented tags and makes) with calibrations in every state: one in calibration,
// one due within the month, one past due, one never recorded; and the public ID-card page of one welder turned on.
export async function seedQualityB(tx: Db, today: Date) {
  const day = (d: Date) => format(d, 'yyyy-MM-dd')
  await tx.insert(t.equipment).values([
    { kind: 'welding-machine', tag: 'PS-07', description: 'Inverter power source, bay 2', serialNumber: 'RF-INV-55810', calibratedOn: day(subMonths(today, 2)), intervalMonths: 12 },
    { kind: 'ammeter', tag: 'AM-03', description: 'Clamp ammeter', serialNumber: 'CA-3391', calibratedOn: day(subMonths(today, 13)), intervalMonths: 12, notes: 'Sent out for calibration; use AM-04 meanwhile.' },
    { kind: 'voltmeter', tag: 'VM-02', description: 'Arc voltmeter', serialNumber: 'AV-2207', calibratedOn: day(subDays(subMonths(today, 6), -10)), intervalMonths: 6 },
    { kind: 'gas-flow-meter', tag: 'GF-11', description: 'Flow meter at the torch' },
    { kind: 'temperature-indicator', tag: 'TI-05', description: 'Contact thermometer for preheat and interpass', serialNumber: 'CT-8812', calibratedOn: day(subMonths(today, 1)), intervalMonths: 12 },
  ])
  const [welder] = await tx.select({ id: t.welders.id }).from(t.welders).where(eq(t.welders.stamp, 'KB-02')).limit(1)
  if (welder) await tx.update(t.welders).set({ cardPublic: true, cardToken: randomBytes(24).toString('base64url') }).where(eq(t.welders.id, welder.id))
}
