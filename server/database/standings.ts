import { and, asc, between, desc, eq, ilike, inArray, or, sql } from 'drizzle-orm'
import type { Db } from './client'
import { accounts, continuityEntries, importedTests, isoValidityRecords, procedures, processStandings, qualificationRevocations, standingRefresh, welders, welderTests } from './schema'
import { allOf, containsPattern } from '../utils/list'
import type { LapseWeek, LapseWeeks } from '../../shared/qualification/lapse-weeks'
import { addDays, format, parseISO } from 'date-fns'
import { renewalOf } from '../../shared/qualification/renewal'
import type { StandingsQuery } from '../../shared/schemas/list-queries'
import { continuityChain, lapsingSoonDays, standingOn, type Chain, type ProcessStanding } from '../../shared/qualification/process-standing'
import type { CodeId } from '../../shared/rules/types'
import { isoChain, sameFamily } from '../../shared/qualification/iso-standing'
import type { IsoRoute, IsoValidityRecord } from '../../shared/rules/iso-9606-1/validity'
import { revocationClause, revocationInForce, revokedChain, type Revocation } from '../../shared/qualification/revocation'
import { isOperatorKey, processOfKey, standingKey } from '../../shared/vocabulary/qualified-as'

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

async function recompute(tx: Db, marked: { welderId: number, process: string }[]) {
  const ids = [...new Set(marked.map(d => d.welderId))]
  // One after the other: PGlite cannot run two statements of one transaction at once.
  const certified = await tx.select({ id: welderTests.id, welderId: welderTests.welderId, process: welderTests.process, processes: welderTests.processes, qualifiedAs: welderTests.qualifiedAs, code: welderTests.code, edition: welderTests.edition, testDate: welderTests.testDate, iso: welderTests.iso })
    .from(welderTests).where(and(inArray(welderTests.welderId, ids), eq(welderTests.status, 'certified')))
    .orderBy(desc(welderTests.testDate), desc(welderTests.id))
  // A combination coupon counts for each of its processes (ASME IX QW-452.1(b)); older tests list none and count for their one.
  // A welding operator's test is kept under its own key (standingKey), apart from the same person's manual qualification.
  // A test counts only for processes of its own code family (ISO 4063 numbers for ISO 9606-1, names otherwise).
  // Imported test history counts once an inspector has confirmed it against the original record, like a certified test
  // (never before). Its ids are negated so they never meet a welder test's id (a revocation's basis is a welder test).
  const confirmed = await tx.select({ id: importedTests.id, welderId: importedTests.welderId, process: importedTests.process, code: importedTests.code, edition: importedTests.edition, testDate: importedTests.testDate })
    .from(importedTests).where(and(inArray(importedTests.welderId, ids), eq(importedTests.state, 'confirmed')))
  const tests = [
    ...certified.flatMap(({ processes, qualifiedAs, ...t }) => (processes.length ? processes : [t.process]).map(process => ({ ...t, process: standingKey(process, qualifiedAs) }))),
    // Imported history may not name its edition: the kept standing says so rather than guessing one.
    ...confirmed.map(t => ({ ...t, edition: t.edition ?? 'edition not recorded', id: -t.id, iso: null as unknown })),
  ].filter(t => sameFamily(t.code, processOfKey(t.process)))
    .sort((a, b) => b.testDate.localeCompare(a.testDate) || b.id - a.id)
  const isoIds = [...new Set(tests.filter(t => t.code === 'iso-9606-1').map(t => t.id))]
  const isoRecords = isoIds.length
    ? await tx.select({ testId: isoValidityRecords.testId, kind: isoValidityRecords.kind, on: isoValidityRecords.on }).from(isoValidityRecords).where(inArray(isoValidityRecords.testId, isoIds))
    : []
  const recordsOf = (testId: number) => isoRecords.filter(r => r.testId === testId).map(r => ({ kind: r.kind, on: r.on }) as IsoValidityRecord)
  const key = (welderId: number, process: string) => `${welderId}|${process}`
  // A marked process also marks its welding-operator key when the welder holds one (continuity is logged per process).
  const held = new Set([...tests, ...marked].map(t => key(t.welderId, t.process)))
  const part = [...new Map(marked.flatMap(d => [d, { welderId: d.welderId, process: standingKey(d.process, 'welding-operator') }])
    .filter(d => !isOperatorKey(d.process) || held.has(key(d.welderId, d.process)))
    .map(d => [key(d.welderId, d.process), d])).values()]
  const uses = await tx.select({ welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn })
    .from(continuityEntries).where(inArray(continuityEntries.welderId, ids))
  const revocations = await tx.select({ id: qualificationRevocations.id, welderId: qualificationRevocations.welderId, process: qualificationRevocations.process, revokedOn: qualificationRevocations.revokedOn, reason: qualificationRevocations.reason, revokedBy: accounts.name, basisTestId: qualificationRevocations.basisTestId })
    .from(qualificationRevocations).innerJoin(accounts, eq(accounts.id, qualificationRevocations.revokedBy))
    .where(inArray(qualificationRevocations.welderId, ids))
  const newest = new Map<string, typeof tests[number]>()
  const testsOf = new Map<string, typeof tests>()
  for (const t of tests) {
    if (!newest.has(key(t.welderId, t.process))) newest.set(key(t.welderId, t.process), t)
    testsOf.set(key(t.welderId, t.process), [...testsOf.get(key(t.welderId, t.process)) ?? [], t])
  }
  const usesOf = new Map<string, string[]>()
  for (const u of uses) {
    const k = key(u.welderId, u.process)
    const list = usesOf.get(k)
    if (list) list.push(u.weldedOn)
    else usesOf.set(k, [u.weldedOn])
  }
  const revocationsOf = new Map<string, Revocation[]>()
  for (const r of revocations) revocationsOf.set(key(r.welderId, r.process), [...revocationsOf.get(key(r.welderId, r.process)) ?? [], r])
  const rows = part.flatMap((d) => {
    const k = key(d.welderId, d.process)
    const test = newest.get(k)
    if (!test) return []
    // A revocation in force cuts the chain on its day (QW-322.1(b)); a later certified test lifts it (QW-322.2(b)).
    const revocation = revocationInForce(revocationsOf.get(k) ?? [], testsOf.get(k) ?? [])
    const logged = usesOf.get(key(d.welderId, processOfKey(d.process))) ?? []
    // An ISO 9606-1 certificate is kept by its 9.2 confirmations and ended by its 9.3 route, not by continuity entries.
    const route = (test.iso as { route?: IsoRoute } | null)?.route
    const kept = test.code === 'iso-9606-1' && route
      ? isoChain({ ...test, code: 'iso-9606-1', route }, recordsOf(test.id))
      : continuityChain({ ...test, code: test.code as CodeId, uses: revocation ? logged.filter(u => u < revocation.revokedOn) : logged })
    const chain = revocation ? revokedChain(kept, revocation) : kept
    return [{ welderId: d.welderId, process: chain.process, code: chain.code, edition: chain.edition, testDate: chain.testDate, lastUse: chain.lastUse, lapsesOn: chain.lapsesOn, rule: chain.rule, revokedOn: chain.revoked?.on ?? null, revokedReason: chain.revoked?.reason ?? null, revokedBy: chain.revoked?.by ?? null }]
  })
  // A process left with no certified test (rare) loses its row; the rest are upserted.
  for (const d of part.filter(d => !newest.has(key(d.welderId, d.process)))) {
    await tx.delete(processStandings).where(and(eq(processStandings.welderId, d.welderId), eq(processStandings.process, d.process)))
  }
  for (const batch of chunked(rows, 250)) {
    await tx.insert(processStandings).values(batch).onConflictDoUpdate({
      target: [processStandings.welderId, processStandings.process],
      set: { code: sql`excluded.code`, edition: sql`excluded.edition`, testDate: sql`excluded.test_date`, lastUse: sql`excluded.last_use`, lapsesOn: sql`excluded.lapses_on`, rule: sql`excluded.rule`, revokedOn: sql`excluded.revoked_on`, revokedReason: sql`excluded.revoked_reason`, revokedBy: sql`excluded.revoked_by` },
    })
  }
}

/** A kept row as a chain; a revoked row carries who revoked it, when and why. */
export function chainOf(row: typeof processStandings.$inferSelect): Chain {
  const { revokedOn, revokedReason, revokedBy, ...chain } = row
  const code = row.code as CodeId
  return { ...chain, code, revoked: revokedOn ? { on: revokedOn, reason: revokedReason ?? '', by: revokedBy ?? '', clause: revocationClause[code]?.revoke ?? 'QW-322.1(b)' } : null }
}

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

/** Each active welder × process standing today, with the welder's name and stamp, soonest lapse first. */
async function activeRosterStandings(db: Db, today: string, q?: string) {
  const pattern = q ? containsPattern(q) : ''
  const roster = await db.select({ id: welders.id, name: welders.name, stamp: welders.stamp }).from(welders)
    .where(allOf([eq(welders.status, 'active'), q ? or(ilike(welders.name, pattern), ilike(welders.stamp, pattern)) : undefined]))
    .orderBy(asc(welders.stamp))
  const standings = await standingsOf(db, roster.map(w => w.id), today)
  return roster.flatMap(w => (standings.get(w.id) ?? []).map(s => ({ ...s, welderId: w.id, welderName: w.name, welderStamp: w.stamp })))
    .sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn) || a.welderStamp.localeCompare(b.welderStamp))
}

/** The continuity board: each active welder × process, soonest lapse first (the first `limit`, with the total). */
export async function standingsBoard(db: Db, query: StandingsQuery, today: string) {
  const rows = (await activeRosterStandings(db, today, query.q))
    .map(r => ({ ...r, renewal: r.standing === 'lapsed' && !r.revoked ? renewalOf[r.code] : null }))
    .filter(r => (!query.process || r.process === query.process) && (!query.standing || r.standing === query.standing))
  return { today, rows: rows.slice(0, query.limit), total: rows.length }
}

// The dashboard lists stop at this many rows (a large shop sees the rest on the continuity page); the counts are whole.
const listLimit = 25

/** The staff dashboard: who lapses in the next 30/60/90 days, who has lapsed, the lapse timeline, tests awaiting certification. */
export async function dashboard(db: Db, today: string) {
  await refreshStandings(db)
  const weeksBack = 13
  const weeksAhead = 26
  const start = format(addDays(parseISO(today), -weeksBack * 7), 'yyyy-MM-dd')
  // Standing words by days left, as standingOn (shared/qualification/process-standing.ts) decides them.
  const days = sql`(${processStandings.lapsesOn} - ${today}::date)`
  const active = and(eq(welders.status, 'active'))
  // Counts and the week buckets in one aggregate pass over the kept standings; the lists are the first rows only.
  const [counts] = await db.select({
    lapsed: sql<number>`count(*) filter (where ${days} <= 0)::int`,
    in30: sql<number>`count(*) filter (where ${days} > 0 and ${days} <= 30)::int`,
    in60: sql<number>`count(*) filter (where ${days} > 0 and ${days} <= 60)::int`,
    in90: sql<number>`count(*) filter (where ${days} > 0 and ${days} <= 90)::int`,
    current: sql<number>`count(*) filter (where ${days} > 30)::int`,
    before: sql<number>`count(*) filter (where ${processStandings.lapsesOn} < ${start}::date)::int`,
    after: sql<number>`count(*) filter (where ${processStandings.lapsesOn} >= ${start}::date + ${(weeksBack + weeksAhead) * 7}::int)::int`,
  }).from(processStandings).innerJoin(welders, eq(welders.id, processStandings.welderId)).where(active)
  const buckets = await db.execute<{ week: number, lapsed: number, lapsing: number, current: number, sample: string[] | string | null }>(sql`
    with b as (
      select ((s.lapses_on - ${start}::date) / 7)::int as week, s.lapses_on - ${today}::date as days_left,
             row_number() over (partition by (s.lapses_on - ${start}::date) / 7 order by s.lapses_on, w.name, w.stamp, s.process) as n,
             w.stamp || ' ' || s.process as label
      from process_standings s join welders w on w.id = s.welder_id and w.status = 'active'
      where s.lapses_on >= ${start}::date and s.lapses_on < ${start}::date + ${(weeksBack + weeksAhead) * 7}::int)
    select week, count(*) filter (where days_left <= 0)::int as lapsed,
           count(*) filter (where days_left > 0 and days_left <= ${lapsingSoonDays})::int as lapsing,
           count(*) filter (where days_left > ${lapsingSoonDays})::int as current,
           array_agg(label order by n) filter (where n <= 5) as sample
    from b group by week order by week`)
  const columns = { standing: processStandings, welderName: welders.name, welderStamp: welders.stamp }
  const listed = (rows: { standing: typeof processStandings.$inferSelect, welderName: string, welderStamp: string }[]) =>
    rows.map(r => ({ ...standingOn(chainOf(r.standing), today), welderId: r.standing.welderId, welderName: r.welderName, welderStamp: r.welderStamp }))
  const join = eq(welders.id, processStandings.welderId)
  // Most recently lapsed first: the ones a renewal test can still catch up with soonest
  const lapsed = listed(await db.select(columns).from(processStandings).innerJoin(welders, join)
    .where(and(active, sql`${days} <= 0`))
    .orderBy(desc(processStandings.lapsesOn), desc(welders.name), desc(welders.stamp), desc(processStandings.process)).limit(listLimit))
  const upcoming = listed(await db.select(columns).from(processStandings).innerJoin(welders, join)
    .where(and(active, sql`${days} > 0 and ${days} <= 90`))
    .orderBy(asc(processStandings.lapsesOn), asc(welders.name), asc(welders.stamp), asc(processStandings.process)).limit(listLimit))
  const awaiting = await db.select({
    id: welderTests.id, testDate: welderTests.testDate, process: welderTests.process, positions: welderTests.positions, form: welderTests.form,
    weld: welderTests.weld, welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp, procedureNumber: procedures.number,
  }).from(welderTests).innerJoin(welders, eq(welders.id, welderTests.welderId)).leftJoin(procedures, eq(procedures.id, welderTests.procedureId))
    .where(eq(welderTests.status, 'recorded')).orderBy(asc(welderTests.testDate)).limit(listLimit)
  const [waiting] = await db.select({ n: sql<number>`count(*)::int` }).from(welderTests).where(eq(welderTests.status, 'recorded'))
  const byWeek = new Map(buckets.rows.map(b => [Number(b.week), b]))
  const weeks: LapseWeek[] = Array.from({ length: weeksBack + weeksAhead }, (_, i) => {
    const b = byWeek.get(i)
    const sample = b?.sample ? (Array.isArray(b.sample) ? b.sample : parseTextArray(b.sample)) : []
    return { from: format(addDays(parseISO(start), i * 7), 'yyyy-MM-dd'), lapsed: Number(b?.lapsed ?? 0), lapsing: Number(b?.lapsing ?? 0), current: Number(b?.current ?? 0), sample }
  })
  return {
    today,
    lapsed: lapsed.map(r => ({ ...r, renewal: r.revoked ? null : renewalOf[r.code] })),
    lapsedCount: Number(counts?.lapsed ?? 0),
    upcoming,
    upcomingCounts: { 30: Number(counts?.in30 ?? 0), 60: Number(counts?.in60 ?? 0), 90: Number(counts?.in90 ?? 0) },
    currentCount: Number(counts?.current ?? 0),
    timeline: { from: start, weeksBack, weeks, before: Number(counts?.before ?? 0), after: Number(counts?.after ?? 0) } satisfies LapseWeeks,
    awaitingCertification: waiting?.n ?? 0,
    awaiting,
  }
}

/** A text[] literal ('{"KB-03 SMAW",...}') as a list, for drivers that return it as text. */
function parseTextArray(value: string): string[] {
  if (!value || value === '{}') return []
  return value.replace(/^\{|\}$/g, '').split(',').map(s => s.replace(/^"|"$/g, ''))
}
