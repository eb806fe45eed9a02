import { sql } from 'drizzle-orm'
import type { Db } from './client'
import { performance } from 'node:perf_hooks'
import { judgeProcedures, judgeWelders, type CandidateRow, type ProcedureRow, type ResolvedJoint, type TestRow } from '../../shared/qualification/joint-coverage'
import { rangeFilterPlan } from '../../shared/qualification/range-filters'
import type { CodeId } from '../../shared/rules/types'
import { refreshStandings } from './standings'
import { coverageTestColumns, droppedSql, parseArray, refreshQualifiedRanges } from './qualified-ranges'
import { welderListsFromRanges } from './coverage-coupons'
import { revocationClause } from '../../shared/qualification/revocation'

type Rows<T> = { rows: T[] }

// How many welders the answer lists as not covered (with their findings); the count is always whole.
export const notCoveredListed = 100

export interface CoverageCandidates {
  procedures: ProcedureRow[]
  /** The welders to judge with the rules, in stamp order. */
  welders: CandidateRow[]
  /** Every active welder with a certified test of the process (those not in `welders` are not covered). */
  candidateCount: number
  /** Welders the stored ranges showed not covered before the rules ran. */
  ruledOut: number
}

export interface CoverageOptions {
  /** Filter on the stored qualified ranges first (default true). */
  prefilter?: boolean
  /** How many welders not covered the answer lists (default `notCoveredListed`). */
  listed?: number
}

/** The approved WPSs with a layer of the process (the transfer of that layer). */
export async function approvedProcedures(db: Db, process: string): Promise<ProcedureRow[]> {
  const procedures = await db.execute(sql`
    select id, number, revision, title, code, edition, unit, ${process}::text as process,
           coalesce((select l->>'transfer' from jsonb_array_elements(layers) l where l->>'process' = ${process} limit 1), transfer) as transfer,
           p_number_a, p_number_b, thickness_min, thickness_max, diameter_min, positions, f_numbers
    from procedures where status = 'approved' and (process = ${process} or ${process} = any(processes)) order by number, revision`) as unknown as Rows<ProcedureRow>
  return procedures.rows.map(p => ({ ...p, positions: parseArray(p.positions), f_numbers: parseArray(p.f_numbers) }))
}

/**
 * The candidates for "who can weld this joint?": the approved WPSs with a layer of the process, and the active welders with
 * a certified test of it (a combination coupon with that process's own deposit, QW-452.1(b)) joined with their kept standing
 * for the process (process_standings, brought up to date first), so continuity is not re-read here.
 *
 * With `prefilter` (the default) the stored qualified ranges (qualified_ranges, brought up to date first) drop in SQL every
 * test the joint's code rules would find not covered on a stated variable; a welder is fetched in full (all their tests of
 * the process) when one test survives, and the first `notCoveredListed` welders without a survivor are fetched too, so the
 * answer's list of welders not covered stays the one the full evaluation gives. Without it every candidate is fetched.
 */
export async function coverageCandidates(db: Db, joint: ResolvedJoint, options: CoverageOptions = {}): Promise<CoverageCandidates> {
  const process = joint.process
  await refreshStandings(db)
  const procedures = await approvedProcedures(db, process)
  const prefilter = options.prefilter !== false
  if (prefilter) await refreshQualifiedRanges(db)
  const candidates = sql`
    from welder_tests t
      join welders w on w.id = t.welder_id and w.status = 'active'
      join process_standings s on s.welder_id = t.welder_id and s.process = ${process}`
  // Welder tests only: a welding operator's machine qualification never answers for a manual joint.
  const ofProcess = sql`t.status = 'certified' and t.qualified_as = 'welder' and (t.process = ${process} or ${process} = any(t.processes))`
  // One statement: with the prefilter, `c` says per welder whether a test survives the stored ranges; the welders fetched
  // are the survivors and the first listed others (at least one, so the count comes back with a row).
  // The stored rows exist for every certified test (refreshed just above, in the same transaction as the queue is emptied);
  // a test marked since then waits in the queue, and its welder is fetched and counted whatever the rows say.
  const picked = prefilter
    ? sql`with ranged as (
        select r.welder_id, w.stamp, bool_or(not ${droppedSql(rangeFilterPlan(joint))}) as hit
        from qualified_ranges r
          join welder_tests rt on rt.id = r.test_id and rt.qualified_as = 'welder'
          join welders w on w.id = r.welder_id and w.status = 'active'
          join process_standings s on s.welder_id = r.welder_id and s.process = ${process}
        where r.process = ${process}
        group by r.welder_id, w.stamp),
      queued as (
        select distinct t.welder_id, w.stamp from qualified_ranges_refresh q join welder_tests t on t.id = q.test_id
          join welders w on w.id = t.welder_id and w.status = 'active'
          join process_standings s on s.welder_id = t.welder_id and s.process = ${process}
        where ${ofProcess}),
      c as (
        select welder_id, stamp, hit from ranged where welder_id not in (select welder_id from queued)
        union all
        select welder_id, stamp, true from queued),
      picked as (
        select welder_id from c where hit
        union all
        (select welder_id from c where not hit order by stamp limit ${Math.max(1, options.listed ?? notCoveredListed)}))`
    : sql``
  const tests = await db.execute(sql`${picked}
    select ${coverageTestColumns(sql`${process}::text`)}, t.welder_id,
           w.name, w.stamp, s.code as chain_code, s.edition as chain_edition, s.test_date::text as chain_test_date,
           s.last_use::text as chain_last_use, s.lapses_on::text as chain_lapses_on, s.rule as chain_rule,
           s.revoked_on::text as revoked_on, s.revoked_reason, s.revoked_by
           ${prefilter ? sql`, (select count(*) from c)::int as candidate_total, (select count(*) from c where hit)::int as survivors` : sql``}
    ${candidates}
      ${prefilter ? sql`join picked p on p.welder_id = t.welder_id` : sql``}
      left join lateral (select e from jsonb_array_elements(t.deposits) e where e->>'process' = ${process} limit 1) d on true
    where ${ofProcess}
    order by w.stamp, t.test_date desc, t.id desc`) as unknown as Rows<TestRow & Record<'name' | 'stamp' | 'revoked_on' | 'revoked_reason' | 'revoked_by' | `chain_${'code' | 'edition' | 'test_date' | 'last_use' | 'lapses_on' | 'rule'}`, string> & { welder_id: number, candidate_total?: number, survivors?: number }>
  const first = tests.rows[0]
  const candidateCount = prefilter ? Number(first?.candidate_total ?? 0) : undefined
  const ruledOut = prefilter ? Number(first?.candidate_total ?? 0) - Number(first?.survivors ?? 0) : 0

  const welders = new Map<number, CandidateRow>()
  for (const row of tests.rows) {
    const { welder_id: welderId, candidate_total: _total, survivors: _survivors, name, stamp, chain_code: code, chain_edition: edition, chain_test_date: testDate, chain_last_use: lastUse, chain_lapses_on: lapsesOn, chain_rule: rule, revoked_on: revokedOn, revoked_reason: revokedReason, revoked_by: revokedBy, ...test } = row
    const id = Number(welderId)
    const candidate = welders.get(id) ?? { id, name, stamp, tests: [], chain: { process, code: code as CodeId, edition, testDate, lastUse, lapsesOn, rule, revoked: revokedOn ? { on: revokedOn, reason: revokedReason, by: revokedBy, clause: revocationClause[code as CodeId]?.revoke ?? 'QW-322.1(b)' } : null } }
    candidate.tests.push({ ...test, positions: parseArray(test.positions) })
    welders.set(id, candidate)
  }
  return {
    procedures,
    welders: [...welders.values()],
    candidateCount: candidateCount ?? welders.size,
    ruledOut,
  }
}

/**
 * Who can weld this joint today: the approved WPSs that cover it and the active welders whose certified tests cover it and
 * who are current, each with the findings behind the answer. By default the stored ranges answer it: each distinct coupon
 * judged once by the rules, the welders graded in SQL (welderListsFromRanges); `prefilter: false` (or stored rows that
 * cannot be trusted yet) judges every candidate's every test (the property test compares the two).
 */
export async function whoCanWeld(db: Db, joint: ResolvedJoint, today: string, options: CoverageOptions = {}) {
  const listed = options.listed ?? notCoveredListed
  const started = performance.now()
  if (options.prefilter !== false) {
    await refreshStandings(db)
    await refreshQualifiedRanges(db)
    const procedureRows = await approvedProcedures(db, joint.process)
    const procedures = judgeProcedures(procedureRows, joint)
    const fast = await welderListsFromRanges(db, joint, today, { lapsed: 100, undecided: 100, notCovered: listed })
    if (fast) {
      const total = performance.now() - started
      const welders = fast.counts.able + fast.counts.lapsed + fast.counts.undecided + fast.counts['not-covered']
      // candidates: welders judged; coupons: their distinct coupons; judged: coupons the rules judged in this request (the
      // others' verdicts were kept from an earlier request for the same joint); ruledOut: coupons the stored ranges ruled out
      const timing = { queryMs: round(total - fast.rulesMs), rulesMs: round(fast.rulesMs), candidates: welders, coupons: fast.coupons, judged: fast.judgedCoupons, ruledOut: fast.ruledOut }
      return answerOf(today, joint, timing, procedures, {
        able: fast.lists.able, lapsed: fast.lists.lapsed, lapsedCount: fast.counts.lapsed, notCovered: fast.lists['not-covered'],
        notCoveredCount: fast.counts['not-covered'], undecided: fast.lists.undecided, undecidedCount: fast.counts.undecided,
      }, listed)
    }
  }
  const rows = await coverageCandidates(db, joint, { ...options, prefilter: false })
  const queried = performance.now()
  const procedures = judgeProcedures(rows.procedures, joint)
  const welders = judgeWelders(rows.welders, joint, today)
  const judged = performance.now()
  const timing = { queryMs: round(queried - started), rulesMs: round(judged - queried), candidates: rows.welders.length, coupons: 0, judged: 0, ruledOut: 0 }
  const lapsed = welders.filter(w => w.covered && !w.current)
  const notCovered = welders.filter(w => w.answer === 'not-covered')
  const undecided = welders.filter(w => w.answer === 'cannot-tell')
  return answerOf(today, joint, timing, procedures, {
    able: welders.filter(w => w.covered && w.current), lapsed, lapsedCount: lapsed.length, notCovered, notCoveredCount: notCovered.length,
    undecided, undecidedCount: undecided.length,
  }, listed)
}

const round = (ms: number) => Math.round(ms * 10) / 10

type Line = ReturnType<typeof judgeWelders>[number]
interface Lists { able: Line[], lapsed: Line[], lapsedCount: number, notCovered: Line[], notCoveredCount: number, undecided: Line[], undecidedCount: number }

function answerOf(today: string, joint: ResolvedJoint, timing: { queryMs: number, rulesMs: number, candidates: number, coupons: number, judged: number, ruledOut: number }, procedures: ReturnType<typeof judgeProcedures>, l: Lists, listed: number) {
  return {
    today, joint, timing,
    procedures: procedures.sort((a, b) => Number(b.covered) - Number(a.covered)),
    welders: {
      // Covered and current today: may weld it (with a WPS that covers it)
      able: l.able,
      // Covered by their tests, but the process has lapsed: renewal needed first (names and dates only)
      lapsed: l.lapsed.slice(0, 100).map(({ id, name, stamp, standing }) => ({ id, name, stamp, standing })),
      lapsedCount: l.lapsedCount,
      // Tested in the process but no test covers the joint: the findings that are not met
      notCovered: l.notCovered.slice(0, listed).map(w => ({ ...w, reasons: w.reasons.filter(r => r.state === 'not-met' || (r.state === undefined && !r.met)) })),
      notCoveredCount: l.notCoveredCount,
      // A variable the joint states was not recorded on their tests (or the reverse): cannot tell until it is recorded
      undecided: l.undecided.slice(0, 100).map(w => ({ ...w, reasons: w.reasons.filter(r => !r.met) })),
      undecidedCount: l.undecidedCount,
    },
  }
}
