import { createHash } from 'node:crypto'
import { sql, type SQL } from 'drizzle-orm'
import type { Db } from './client'
import { qualifiedCoupons, qualifiedRanges } from './schema'
import { coverageTestInput, type TestRow } from '../../shared/qualification/joint-coverage'
import { deriveQualifiedRanges, QUALIFIED_RANGES_RULES_VERSION } from '../../shared/qualification/qualified-ranges'
import type { DropCondition, RangeFilterPlan } from '../../shared/qualification/range-filters'
import type { CodeId, Unit } from '../../shared/rules/types'

type Rows<T> = { rows: T[] }

/**
 * The columns of one certified test as "Who can weld it?" judges it for `process` (a combination coupon with that
 * process's own transfer and deposit, QW-452.1(b)); `d` is the lateral join of that process's deposit entry. One list,
 * read by the coverage query and by the derivation of the stored ranges, so both judge the same coupon.
 */
export const coverageTestColumns = (process: SQL) => sql`t.id, t.test_date::text as test_date, t.code, t.edition, t.unit, ${process} as process,
  case when d.e is null then t.transfer else d.e->>'transfer' end as transfer, t.form, t.weld, t.coupon_thickness,
  case when d.e is null then t.deposit_thickness else (d.e->>'depositThickness')::float8 end as deposit_thickness, t.layers,
  t.outside_diameter, t.p_number, t.f_number, t.backing, t.positions, t.progression`

/**
 * One digest per distinct coupon as the covers rule reads it: the code, edition and unit with the rules input (the same
 * string judgeWelders memoises on). Two tests with the same key get the same verdict for any joint.
 */
export const couponKey = (code: string, edition: string, unit: string, input: unknown) =>
  createHash('sha1').update(`${code}|${edition}|${unit}|${JSON.stringify(input)}`).digest('base64url')

const chunked = <T>(list: T[], size: number) => Array.from({ length: Math.ceil(list.length / size) }, (_, i) => list.slice(i * size, (i + 1) * size))

/**
 * Derives the qualified ranges of every test a trigger marked (any insert, update or delete of a welder test), five hundred
 * at a time, each batch one transaction: the rows of a test are replaced by those of its current certified content, per
 * process, stamped with the current rules version. Called before every read that filters on them and at start-up.
 */
export async function refreshQualifiedRanges(db: Db) {
  let derived = 0
  for (;;) {
    const done = await db.transaction(async (tx) => {
      const marked = await tx.execute<{ test_id: number }>(sql`
        with batch as (select test_id from qualified_ranges_refresh limit 500 for update skip locked)
        delete from qualified_ranges_refresh q using batch b where q.test_id = b.test_id returning q.test_id`)
      const ids = marked.rows.map(r => Number(r.test_id))
      if (!ids.length) return true
      const list = `{${ids.join(',')}}`
      const tests = await tx.execute(sql`
        select ${coverageTestColumns(sql`p.process`)}, t.welder_id, t.qualified_as
        from welder_tests t
          cross join lateral (select distinct x as process from unnest(array[t.process] || t.processes) x) p
          left join lateral (select e from jsonb_array_elements(t.deposits) e where e->>'process' = p.process limit 1) d on true
        where t.id = any(${list}::int[]) and t.status = 'certified'`) as unknown as Rows<TestRow & { welder_id: number, qualified_as: string }>
      await tx.execute(sql`delete from qualified_ranges where test_id = any(${list}::int[])`)
      const rows = tests.rows.map((t) => {
        const input = coverageTestInput({ ...t, positions: parseArray(t.positions) })
        return {
          testId: Number(t.id), process: t.process, welderId: Number(t.welder_id), code: t.code, edition: t.edition, unit: t.unit,
          rulesVersion: QUALIFIED_RANGES_RULES_VERSION, testDate: t.test_date, qualifiedAs: t.qualified_as,
          input, inputKey: couponKey(t.code, t.edition, t.unit, input),
          ...deriveQualifiedRanges({ code: t.code as CodeId, edition: t.edition, unit: t.unit as Unit, process: t.process, weld: t.weld as 'groove' | 'fillet', input }),
        }
      })
      const coupons = new Map(rows.map(r => [r.inputKey, { inputKey: r.inputKey, code: r.code, edition: r.edition, unit: r.unit, input: r.input }]))
      for (const batch of chunked([...coupons.values()], 250)) await tx.insert(qualifiedCoupons).values(batch).onConflictDoNothing()
      for (const batch of chunked(rows.map(({ input: _input, ...row }) => row), 250)) await tx.insert(qualifiedRanges).values(batch)
      derived += rows.length
      return false
    })
    if (done) return derived
  }
}

/**
 * Marks for derivation every row derived by another rules version and every certified test without rows (start-up, after
 * a release changed the rules), then derives them. Returns how many rows were derived.
 */
export async function recomputeStaleQualifiedRanges(db: Db) {
  await db.execute(sql`
    insert into qualified_ranges_refresh (test_id)
      select distinct test_id from qualified_ranges where rules_version <> ${QUALIFIED_RANGES_RULES_VERSION}
      union
      select t.id from welder_tests t where t.status = 'certified' and not exists (select 1 from qualified_ranges r where r.test_id = t.id)
    on conflict do nothing`)
  return refreshQualifiedRanges(db)
}

const columnNames = new Set(['weld', 'positions_groove', 'positions_groove_pipe', 'positions_fillet', 'deposit_max_micro', 'thickness_min_micro',
  'thickness_max_micro', 'diameter_min_micro', 'f_numbers', 'backing', 'transfer', 'progression'])

function dropSql(c: DropCondition): SQL {
  if (c.op === 'always') return sql`true`
  if (!columnNames.has(c.column)) throw new Error(`unknown ranges column ${c.column}`)
  const col = sql.raw(`r.${c.column}`)
  const v = c.value
  let test: SQL
  switch (c.op) {
    case 'lacks': test = sql`not (${col} @> ${`{${(v as string[]).join(',')}}`}::text[])`
      break
    case 'excludes': test = sql`not (${Number(v)}::int = any(${col}))`
      break
    case 'above': test = sql`${Number(v)}::bigint > ${col}`
      break
    case 'below': test = sql`${Number(v)}::bigint < ${col}`
      break
    case 'eq': test = typeof v === 'boolean' ? sql`${col} = ${v}::boolean` : sql`${col} = ${String(v)}::text`
      break
    case 'ne': test = sql`${col} <> ${String(v)}::text`
      break
  }
  const guards = [sql`${col} is not null`]
  if (c.unit) guards.push(sql`r.unit = ${c.unit}::text`)
  if (c.weld) guards.push(sql`r.weld = ${c.weld}::text`)
  return sql`(${sql.join([...guards, test], sql` and `)})`
}

/**
 * True when the stored ranges row `r` (left-joined: null when the test has none yet) shows the test cannot cover the
 * joint: derived by the current rules version, of a code with a plan, and one drop condition holds. Everything else
 * stays a candidate for the rules.
 */
export function droppedSql(plan: RangeFilterPlan): SQL {
  const codes = Object.entries(plan).filter(([, conditions]) => conditions && conditions.length > 0)
  if (!codes.length) return sql`false`
  const perCode = codes.map(([code, conditions]) => sql`(r.code = ${code}::text and (${sql.join(conditions!.map(dropSql), sql` or `)}))`)
  return sql`coalesce(r.derived and r.rules_version = ${QUALIFIED_RANGES_RULES_VERSION}::int and (${sql.join(perCode, sql` or `)}), false)`
}

/** node-postgres and PGlite both return text[] as arrays; a literal '{a,b}' is parsed for safety. */
export function parseArray(value: string[] | string | null): string[] {
  if (Array.isArray(value)) return value
  if (!value || value === '{}') return []
  return value.replace(/^\{|\}$/g, '').split(',').map(s => s.replace(/^"|"$/g, ''))
}

/**
 * Gathers the planner's statistics. PGlite runs no autovacuum, so without this its planner never learns the table sizes and
 * picks nested loops over whole indexes on a large shop (seconds instead of milliseconds); start-up runs it on PGlite.
 */
export async function analyzeTables(db: Db) {
  await db.execute(sql`analyze`)
}
