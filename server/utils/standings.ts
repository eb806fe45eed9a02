import { and, desc, eq, inArray } from 'drizzle-orm'
import { format } from 'date-fns'
import type { Db } from '../database/client'
import { continuityEntries, welderTests } from '../database/schema'
import { processStanding, type ProcessStanding } from '#shared/qualification/process-standing'
import type { CodeId } from '#shared/rules/types'

export function todayIso() {
  return format(new Date(), 'yyyy-MM-dd')
}

/** Per welder, per process: where each stands today, from the latest certified test and the continuity log. */
export async function standingsOfWelders(db: Db, welderIds: number[], today = todayIso()): Promise<Map<number, ProcessStanding[]>> {
  const result = new Map<number, ProcessStanding[]>()
  if (!welderIds.length) return result
  const [tests, uses] = await Promise.all([
    db.select({ welderId: welderTests.welderId, process: welderTests.process, code: welderTests.code, edition: welderTests.edition, testDate: welderTests.testDate })
      .from(welderTests)
      .where(and(inArray(welderTests.welderId, welderIds), eq(welderTests.status, 'certified')))
      .orderBy(desc(welderTests.testDate)),
    db.select({ welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn })
      .from(continuityEntries)
      .where(inArray(continuityEntries.welderId, welderIds)),
  ])
  const usesOf = new Map<string, string[]>()
  for (const u of uses) {
    const key = `${u.welderId}|${u.process}`
    usesOf.set(key, [...(usesOf.get(key) ?? []), u.weldedOn])
  }
  const seen = new Set<string>()
  for (const t of tests) {
    const key = `${t.welderId}|${t.process}`
    if (seen.has(key)) continue // the latest certified test of each process starts its chain
    seen.add(key)
    const standing = processStanding({ ...t, code: t.code as CodeId, uses: usesOf.get(key) ?? [], today })
    result.set(t.welderId, [...(result.get(t.welderId) ?? []), standing])
  }
  return result
}
