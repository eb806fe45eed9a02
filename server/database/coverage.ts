import { sql } from 'drizzle-orm'
import type { Db } from './client'
import type { CandidateRow, ProcedureRow } from '../../shared/qualification/joint-coverage'

/**
 * One statement: the approved WPSs of a process, and every active welder with a certified test of it, carrying
 * those tests (newest first) and the continuity dates of that process. The rules then judge the rows.
 */
export async function coverageCandidates(db: Db, process: string): Promise<{ procedures: ProcedureRow[], welders: CandidateRow[] }> {
  const result = await db.execute(sql`
    with wps as (
      select id, number, revision, title, code, edition, unit, process, transfer, p_number_a, p_number_b,
             thickness_min, thickness_max, diameter_min, positions, f_numbers
      from procedures where status = 'approved' and process = ${process}
    ), tests as (
      select t.id, t.welder_id, t.test_date::text as test_date, t.code, t.edition, t.unit, t.process, t.transfer, t.form, t.weld,
             t.coupon_thickness, t.deposit_thickness, t.layers, t.outside_diameter, t.p_number, t.f_number, t.backing, t.positions
      from welder_tests t join welders w on w.id = t.welder_id
      where t.status = 'certified' and t.process = ${process} and w.status = 'active'
    ), candidates as (
      select w.id, w.name, w.stamp,
             (select json_agg(to_jsonb(x) - 'welder_id' order by x.test_date desc, x.id desc) from tests x where x.welder_id = w.id) as tests,
             (select coalesce(json_agg(c.welded_on::text order by c.welded_on), '[]'::json)
                from continuity_entries c where c.welder_id = w.id and c.process = ${process}) as uses
      from welders w where w.id in (select welder_id from tests)
    )
    select (select coalesce(json_agg(wps order by number, revision), '[]'::json) from wps) as procedures,
           (select coalesce(json_agg(candidates order by stamp), '[]'::json) from candidates) as welders
  `)
  const rows = (result as unknown as { rows: { procedures: ProcedureRow[] | string, welders: CandidateRow[] | string }[] }).rows
  const row = rows[0]!
  const parse = <T>(v: T | string): T => (typeof v === 'string' ? JSON.parse(v) as T : v)
  return { procedures: parse(row.procedures), welders: parse(row.welders) }
}
