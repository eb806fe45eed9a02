import { randomBytes } from 'node:crypto'
import { and, asc, desc, eq, inArray } from 'drizzle-orm'
import type { Db } from './client'
import { procedures, welders, welderTests } from './schema'
import { qualifiedRangesOf } from '../../shared/qualification/test-ranges'
import { depositsOf, variablesOf } from './welder-test-columns'
import { rangesInWords } from '../../shared/qualification/plain-words'
import type { WelderRangesResult } from '../../shared/rules/results'
import type { Unit } from '../../shared/rules/types'

/** A welder's own page: every test, what each certified one covers in plain words, and the WPSs of their current processes. */
export async function ownQualifications(db: Db, welderId: number, standings: { process: string, standing: string }[]) {
  const [welder] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp, calendarToken: welders.calendarToken })
    .from(welders).where(eq(welders.id, welderId)).limit(1)
  if (!welder) return null
  const tests = await db.select().from(welderTests).where(eq(welderTests.welderId, welderId)).orderBy(desc(welderTests.testDate), desc(welderTests.id))
  const current = standings.filter(s => s.standing !== 'lapsed').map(s => s.process)
  const wps = current.length
    ? await db.select({ id: procedures.id, number: procedures.number, revision: procedures.revision, title: procedures.title, process: procedures.process })
        .from(procedures).where(and(eq(procedures.status, 'approved'), inArray(procedures.process, current))).orderBy(asc(procedures.number))
    : []
  const described = tests.map((t) => {
    const ranges = qualifiedRangesOf(variablesOf(t))
    return {
      id: t.id, testDate: t.testDate, process: t.process, processes: depositsOf(t), transfer: t.transfer, form: t.form, weld: t.weld, positions: t.positions,
      status: t.status, unit: t.unit, couponThickness: t.couponThickness, outsideDiameter: t.outsideDiameter, code: t.code, edition: t.edition,
      covers: t.status === 'certified' && !('error' in ranges) ? rangesInWords(ranges as unknown as WelderRangesResult, t.unit as Unit) : [],
    }
  })
  return { welder: { id: welder.id, name: welder.name, stamp: welder.stamp }, hasFeed: Boolean(welder.calendarToken), tests: described, procedures: wps }
}

/** A new secret for the welder's subscribable calendar (the old link stops working). */
export async function rotateCalendarToken(db: Db, welderId: number) {
  const token = randomBytes(24).toString('base64url')
  await db.update(welders).set({ calendarToken: token }).where(eq(welders.id, welderId))
  return token
}

export async function clearCalendarToken(db: Db, welderId: number) {
  await db.update(welders).set({ calendarToken: null }).where(eq(welders.id, welderId))
}

export async function welderByCalendarToken(db: Db, token: string) {
  const [row] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(and(eq(welders.calendarToken, token), eq(welders.status, 'active'))).limit(1)
  return row ?? null
}

export async function welderName(db: Db, welderId: number) {
  const [row] = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders).where(eq(welders.id, welderId)).limit(1)
  return row ?? null
}
