import { performance } from 'node:perf_hooks'
import { sql } from 'drizzle-orm'
import type { Db } from './client'
import { couponJudge, welderLine, type CouponVerdict, type ResolvedJoint } from '../../shared/qualification/joint-coverage'
import type { CoverAnswer } from '../../shared/rules/results'
import type { WelderTestInput } from '../../shared/rules/inputs'
import type { CodeId } from '../../shared/rules/types'
import { QUALIFIED_RANGES_RULES_VERSION } from '../../shared/qualification/qualified-ranges'
import { rangeFilterPlan } from '../../shared/qualification/range-filters'
import { revocationClause } from '../../shared/qualification/revocation'
import { droppedSql } from './qualified-ranges'

type Rows<T> = { rows: T[] }

/** How many welders each list of the answer shows (the counts are always whole). */
export interface ListLimits { lapsed: number, undecided: number, notCovered: number }

interface CouponRow { queued: boolean, stale: boolean, input_key: string | null, dropped: boolean }
interface CouponInput { input_key: string, code: string, edition: string, unit: string, input: WelderTestInput }

/**
 * The distinct coupons (digests of code, edition, unit and the rules input) among the stored ranges of the process's
 * welder tests, each with whether its stored ranges already show it cannot cover the joint; and whether the stored rows
 * can be trusted (no test waiting in the refresh queue, every row of the process derived by the current rules version).
 */
export async function rangeCoupons(db: Db, joint: ResolvedJoint) {
  const result = await db.execute(sql`
    select f.queued, f.stale, k.input_key, k.dropped
    from (select exists (select 1 from qualified_ranges_refresh) as queued,
                 exists (select 1 from qualified_ranges q where q.process = ${joint.process}
                   and (q.rules_version < ${QUALIFIED_RANGES_RULES_VERSION}::int or q.rules_version > ${QUALIFIED_RANGES_RULES_VERSION}::int or q.input_key is null)) as stale) f
      left join lateral (
        select r.input_key, bool_and(${droppedSql(rangeFilterPlan(joint))}) as dropped
        from qualified_ranges r where r.process = ${joint.process} and r.qualified_as = 'welder' group by r.input_key) k on true`) as unknown as Rows<CouponRow>
  const first = result.rows[0]
  return { trusted: Boolean(first && !first.queued && !first.stale), coupons: result.rows.filter(r => r.input_key !== null) }
}

/** The rules input of the coupons named (one stored row each). */
async function couponInputs(db: Db, keys: string[]) {
  if (!keys.length) return []
  const result = await db.execute(sql`
    select c.input_key, c.code, c.edition, c.unit, c.input from qualified_coupons c
    where c.input_key = any(${`{${keys.join(',')}}`}::text[])`) as unknown as Rows<CouponInput>
  return result.rows
}

/**
 * Verdicts already given, per joint: a coupon's verdict is a pure function of the coupon, the joint and the rules (which
 * change only with a release, that is a restart), so a joint asked again is judged only on coupons not seen before.
 * Bounded: the joints asked longest ago are forgotten first.
 */
const verdictCache = new Map<string, Map<string, CouponVerdict>>()
const cachedJoints = 32
function verdictsFor(joint: ResolvedJoint) {
  const key = `${QUALIFIED_RANGES_RULES_VERSION}|${JSON.stringify(joint)}`
  const known = verdictCache.get(key)
  if (known) {
    verdictCache.delete(key)
    verdictCache.set(key, known)
    return known
  }
  const fresh = new Map<string, CouponVerdict>()
  verdictCache.set(key, fresh)
  if (verdictCache.size > cachedJoints) verdictCache.delete(verdictCache.keys().next().value!)
  return fresh
}

type Kind = 'able' | 'lapsed' | 'undecided' | 'not-covered'
type WelderRow = Record<'name' | 'stamp' | 'shown_key' | 'chain_code' | 'chain_edition' | 'chain_test_date' | 'chain_lapses_on' | 'chain_rule', string>
  & Record<'chain_last_use' | 'revoked_on' | 'revoked_reason' | 'revoked_by', string | null>
  & { welder_id: number, kind: Kind, total: number, shown_test: number, test_ids: number[] | string | null, queued: boolean }

/**
 * Every active welder with a certified welder test of the process and a kept standing for it, graded in SQL from the
 * verdicts of their coupons (2: a test covers the joint, 1: none covers and one cannot tell, 0: not covered) and their
 * standing today (current when the kept standing lapses after today). Returns the welders to list (all who may weld it,
 * the first of each other list in stamp order) with the count of each list.
 */
export async function rangeWelders(db: Db, process: string, today: string, covered: string[], telling: string[], limits: ListLimits) {
  const result = await db.execute(sql`
    with v as (
      select unnest(${`{${covered.join(',')}}`}::text[]) as input_key, 2 as grade
      union all select unnest(${`{${telling.join(',')}}`}::text[]), 1),
    g as (
      select distinct on (r.welder_id) r.welder_id, coalesce(v.grade, 0) as grade, r.input_key as shown_key, r.test_id as shown_test
      from qualified_ranges r left join v on v.input_key = r.input_key
      where r.process = ${process} and r.qualified_as = 'welder'
      order by r.welder_id, coalesce(v.grade, 0) desc, r.test_date desc, r.test_id desc),
    c as (
      select g.*, w.name, w.stamp, s.code as chain_code, s.edition as chain_edition, s.test_date::text as chain_test_date,
             s.last_use::text as chain_last_use, s.lapses_on::text as chain_lapses_on, s.rule as chain_rule,
             s.revoked_on::text as revoked_on, s.revoked_reason, s.revoked_by,
             case when g.grade = 2 and s.lapses_on > ${today}::date then 'able' when g.grade = 2 then 'lapsed'
                  when g.grade = 1 then 'undecided' else 'not-covered' end as kind
      from g join welders w on w.id = g.welder_id and w.status = 'active'
        join process_standings s on s.welder_id = g.welder_id and s.process = ${process}),
    n as (select c.*, row_number() over (partition by c.kind order by c.stamp) as rn, count(*) over (partition by c.kind) as total from c)
    select n.welder_id, n.kind, n.total::int as total, n.name, n.stamp, n.shown_key, n.shown_test, n.chain_code, n.chain_edition,
           n.chain_test_date, n.chain_last_use, n.chain_lapses_on, n.chain_rule, n.revoked_on, n.revoked_reason, n.revoked_by,
           case when n.grade < 2 then (select array_agg(q.test_id order by q.test_date desc, q.test_id desc) from qualified_ranges q
             where q.process = ${process} and q.welder_id = n.welder_id and q.qualified_as = 'welder') end as test_ids,
           exists (select 1 from qualified_ranges_refresh) as queued
    from n
    where n.kind = 'able' or (n.kind = 'lapsed' and n.rn <= ${limits.lapsed}) or (n.kind = 'undecided' and n.rn <= ${limits.undecided})
       or (n.kind = 'not-covered' and n.rn <= ${limits.notCovered})
    order by n.stamp`) as unknown as Rows<WelderRow>
  return result.rows
}

const idList = (v: number[] | string) => (Array.isArray(v) ? v : v.replace(/^\{|\}$/g, '').split(',').filter(Boolean)).map(Number)

/**
 * "Who can weld it?" from the stored ranges: each distinct coupon of the process judged once by the covers rule of its
 * code (coupons the stored ranges rule out are judged only if a listed welder shows them; verdicts kept per joint), the welders graded and counted
 * in SQL, and the listed welders' lines built from the verdicts exactly as judgeWelders builds them. Returns null when the
 * stored rows cannot be trusted (a test waits in the refresh queue, or a row is of another rules version): the caller then
 * judges every candidate.
 */
export async function welderListsFromRanges(db: Db, joint: ResolvedJoint, today: string, limits: ListLimits) {
  const { trusted, coupons } = await rangeCoupons(db, joint)
  if (!trusted) return null
  const judgeCoupon = couponJudge(joint)
  const verdicts = verdictsFor(joint)
  let rulesMs = 0
  let judged = 0
  const judgeAll = async (keys: string[]) => {
    for (const c of await couponInputs(db, keys.filter(k => !verdicts.has(k)))) {
      const started = performance.now()
      verdicts.set(c.input_key, judgeCoupon(c.code, c.edition, c.unit, c.input))
      rulesMs += performance.now() - started
      judged++
    }
  }
  const kept = coupons.filter(c => !c.dropped).map(c => c.input_key!)
  await judgeAll(kept)
  const covered: string[] = []
  const telling: string[] = []
  for (const key of kept) {
    const verdict = verdicts.get(key)!
    if (verdict.covered) covered.push(key)
    else if (verdict.answer === 'cannot-tell') telling.push(key)
  }
  const rows = await rangeWelders(db, joint.process, today, covered, telling, limits)
  if (rows.some(r => r.queued)) return null
  // Coupons the stored ranges ruled out are judged only when a listed welder shows one (for the findings).
  await judgeAll([...new Set(rows.map(r => r.shown_key))])
  const counts: Record<Kind, number> = { 'able': 0, 'lapsed': 0, 'undecided': 0, 'not-covered': 0 }
  const lists: Record<Kind, ReturnType<typeof welderLine>[]> = { 'able': [], 'lapsed': [], 'undecided': [], 'not-covered': [] }
  const answers: Record<Kind, CoverAnswer> = { 'able': 'covered', 'lapsed': 'covered', 'undecided': 'cannot-tell', 'not-covered': 'not-covered' }
  for (const r of rows) {
    counts[r.kind] = Number(r.total)
    const code = r.chain_code as CodeId
    const chain = {
      process: joint.process, code, edition: r.chain_edition, testDate: r.chain_test_date, lastUse: r.chain_last_use, lapsesOn: r.chain_lapses_on, rule: r.chain_rule,
      revoked: r.revoked_on ? { on: r.revoked_on, reason: r.revoked_reason, by: r.revoked_by, clause: revocationClause[code]?.revoke ?? 'QW-322.1(b)' } : null,
    }
    const answer = answers[r.kind]
    const line = welderLine({ id: Number(r.welder_id), name: r.name, stamp: r.stamp, chain } as Parameters<typeof welderLine>[0], verdicts.get(r.shown_key)!, answer, answer === 'covered' ? [Number(r.shown_test)] : idList(r.test_ids!), today)
    lists[r.kind].push(line)
  }
  return { lists, counts, coupons: coupons.length, judgedCoupons: judged, ruledOut: coupons.length - kept.length, rulesMs }
}
