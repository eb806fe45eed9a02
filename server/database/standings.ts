import { and, asc, between, desc, eq, inArray, sql } from 'drizzle-orm'
import type { Db } from './client'
import { continuityEntries, processStandings, standingRefresh, welders, welderTests } from './schema'
import { continuityChain, standingOn, type Chain, type ProcessStanding } from '../../shared/qualification/process-standing'
import type { CodeId } from '../../shared/rules/types'

const chunked = <T>(list: T[], size: number) => Array.from({ length: Math.ceil(list.length / size) }, (_, i) => list.slice(i * size, (i + 1) * size))

/**
 * Recomputes every welder × process that a trigger marked since the last read (a test or a continuity
 * entry changed), a thousand at a time. Each batch is one transaction: a concurrent reader waits for it
 * and then reads the new rows.
 */
export async function refreshStandings(db: Db) {
  for (;;) {
    const done = await db.transaction(async (tx) => {
      const marked = await tx.execute<{ welder_id: number, process: string }>(sql`
        with batch as (select welder_id, process from ${standingRefresh} limit 1000 for update skip locked)
        delete from ${standingRefresh} s using batch b where s.welder_id = b.welder_id and s.process = b.process
        returning s.welder_id, s.process`)
      const part = marked.rows.map(r => ({ welderId: Number(r.welder_id), process: String(r.process) }))
      if (!part.length) return true
      await recompute(tx as unknown as Db, part)
      return false
    })
    if (done) return
  }
}

async function recompute(tx: Db, part: { welderId: number, process: string }[]) {
  const ids = [...new Set(part.map(d => d.welderId))]
  // One after the other: PGlite cannot run two statements of one transaction at once.
  const certified = await tx.select({ welderId: welderTests.welderId, process: welderTests.process, processes: welderTests.processes, code: welderTests.code, edition: welderTests.edition, testDate: welderTests.testDate })
    .from(welderTests).where(and(inArray(welderTests.welderId, ids), eq(welderTests.status, 'certified')))
    .orderBy(desc(welderTests.testDate), desc(welderTests.id))
  // A combination coupon counts for each of its processes (ASME IX QW-452.1(b)); older tests list none and count for their one.
  const tests = certified.flatMap(({ processes, ...t }) => (processes.length ? processes : [t.process]).map(process => ({ ...t, process })))
  const uses = await tx.select({ welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn })
    .from(continuityEntries).where(inArray(continuityEntries.welderId, ids))
  const key = (welderId: number, process: string) => `${welderId}|${process}`
  const newest = new Map<string, typeof tests[number]>()
  for (const t of tests) if (!newest.has(key(t.welderId, t.process))) newest.set(key(t.welderId, t.process), t)
  const usesOf = new Map<string, string[]>()
  for (const u of uses) {
    const k = key(u.welderId, u.process)
    const list = usesOf.get(k)
    if (list) list.push(u.weldedOn)
    else usesOf.set(k, [u.weldedOn])
  }
  const rows = part.flatMap((d) => {
    const test = newest.get(key(d.welderId, d.process))
    if (!test) return []
    const chain = continuityChain({ ...test, code: test.code as CodeId, uses: usesOf.get(key(d.welderId, d.process)) ?? [] })
    return [{ welderId: d.welderId, process: chain.process, code: chain.code, edition: chain.edition, testDate: chain.testDate, lastUse: chain.lastUse, lapsesOn: chain.lapsesOn, rule: chain.rule }]
  })
  // A process left with no certified test (rare) loses its row; the rest are upserted.
  for (const d of part.filter(d => !newest.has(key(d.welderId, d.process)))) {
    await tx.delete(processStandings).where(and(eq(processStandings.welderId, d.welderId), eq(processStandings.process, d.process)))
  }
  for (const batch of chunked(rows, 250)) {
    await tx.insert(processStandings).values(batch).onConflictDoUpdate({
      target: [processStandings.welderId, processStandings.process],
      set: { code: sql`excluded.code`, edition: sql`excluded.edition`, testDate: sql`excluded.test_date`, lastUse: sql`excluded.last_use`, lapsesOn: sql`excluded.lapses_on`, rule: sql`excluded.rule` },
    })
  }
}

const chainOf = (row: typeof processStandings.$inferSelect): Chain => ({ ...row, code: row.code as CodeId })

/** Per welder, per process: where each stands on `today`. */
export async function standingsOf(db: Db, welderIds: number[], today: string): Promise<Map<number, ProcessStanding[]>> {
  const result = new Map<number, ProcessStanding[]>()
  if (!welderIds.length) return result
  await refreshStandings(db)
  const rows = await db.select().from(processStandings)
    .where(inArray(processStandings.welderId, welderIds)).orderBy(asc(processStandings.process))
  for (const row of rows) {
    const list = result.get(row.welderId)
    const standing = standingOn(chainOf(row), today)
    if (list) list.push(standing)
    else result.set(row.welderId, [standing])
  }
  return result
}

export type RosterStanding = ProcessStanding & { welderId: number, welderName: string, welderStamp: string }

/** The query behind the lapse list, on its own (the bench times it as the floor of the route). */
export function lapseListQuery(db: Db, from: string, to: string) {
  return db.select({ standing: processStandings, welderName: welders.name, welderStamp: welders.stamp })
    .from(processStandings).innerJoin(welders, eq(welders.id, processStandings.welderId))
    .where(and(between(processStandings.lapsesOn, from, to), eq(welders.status, 'active')))
    .orderBy(asc(processStandings.lapsesOn), asc(welders.name))
}

/** Active welders' qualifications that lapse between `from` and `to` (inclusive), soonest first: one indexed query. */
export async function lapsesBetween(db: Db, from: string, to: string, today: string): Promise<RosterStanding[]> {
  await refreshStandings(db)
  const rows = await lapseListQuery(db, from, to)
  return rows.map(r => ({ ...standingOn(chainOf(r.standing), today), welderId: r.standing.welderId, welderName: r.welderName, welderStamp: r.welderStamp }))
}
