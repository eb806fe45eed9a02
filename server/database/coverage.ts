import { sql } from 'drizzle-orm'
import type { Db } from './client'
import type { CandidateRow, ProcedureRow, TestRow } from '../../shared/qualification/joint-coverage'

type Rows<T> = { rows: T[] }

/**
 * The candidates for "who can weld this joint?": the approved WPSs of the process, every certified test of it by an
 * active welder (flat rows, newest first), and each such welder's continuity dates after their newest test (the only
 * uses that can extend the chain). Flat rows, no per-row JSON: at 2,000 welders building JSON cost more than the scan.
 */
export async function coverageCandidates(db: Db, process: string): Promise<{ procedures: ProcedureRow[], welders: CandidateRow[] }> {
  const procedures = await db.execute(sql`
    select id, number, revision, title, code, edition, unit, process, transfer, p_number_a, p_number_b,
           thickness_min, thickness_max, diameter_min, positions, f_numbers
    from procedures where status = 'approved' and process = ${process} order by number, revision`) as unknown as Rows<ProcedureRow>
  const tests = await db.execute(sql`
    select t.id, t.welder_id, t.test_date::text as test_date, t.code, t.edition, t.unit, t.process, t.transfer, t.form, t.weld,
           t.coupon_thickness, t.deposit_thickness, t.layers, t.outside_diameter, t.p_number, t.f_number, t.backing, t.positions,
           w.name, w.stamp
    from welder_tests t join welders w on w.id = t.welder_id
    where t.status = 'certified' and t.process = ${process} and w.status = 'active'
    order by w.stamp, t.test_date desc, t.id desc`) as unknown as Rows<TestRow & { welder_id: number, name: string, stamp: string }>
  const uses = await db.execute(sql`
    with newest as (
      select t.welder_id, max(t.test_date) as d from welder_tests t join welders w on w.id = t.welder_id
      where t.status = 'certified' and t.process = ${process} and w.status = 'active' group by t.welder_id
    )
    select n.welder_id, array_agg(c.welded_on::text order by c.welded_on) as uses
    from newest n join continuity_entries c on c.welder_id = n.welder_id and c.process = ${process} and c.welded_on > n.d
    group by n.welder_id`) as unknown as Rows<{ welder_id: number, uses: string[] | string }>

  const usesOf = new Map(uses.rows.map(u => [Number(u.welder_id), parseArray(u.uses)]))
  const welders = new Map<number, CandidateRow>()
  for (const { welder_id: welderId, name, stamp, ...test } of tests.rows) {
    const id = Number(welderId)
    const row = welders.get(id) ?? { id, name, stamp, tests: [], uses: usesOf.get(id) ?? [] }
    row.tests.push({ ...test, positions: parseArray(test.positions) })
    welders.set(id, row)
  }
  return { procedures: procedures.rows.map(p => ({ ...p, positions: parseArray(p.positions), f_numbers: parseArray(p.f_numbers) })), welders: [...welders.values()] }
}

/** node-postgres and PGlite both return text[] as arrays; a literal '{a,b}' is parsed for safety. */
function parseArray(value: string[] | string | null): string[] {
  if (Array.isArray(value)) return value
  if (!value || value === '{}') return []
  return value.replace(/^\{|\}$/g, '').split(',').map(s => s.replace(/^"|"$/g, ''))
}
