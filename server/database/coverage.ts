import { sql } from 'drizzle-orm'
import type { Db } from './client'
import type { CandidateRow, ProcedureRow, TestRow } from '../../shared/qualification/joint-coverage'
import type { CodeId } from '../../shared/rules/types'
import { refreshStandings } from './standings'
import { revocationClause } from '../../shared/qualification/revocation'

type Rows<T> = { rows: T[] }

/**
 * The candidates for "who can weld this joint?": the approved WPSs with a layer of the process, and every certified test of it
 * (a combination coupon with that process's own deposit, QW-452.1(b)) by an
 * active welder (welder tests only: a welding operator's machine qualification never answers for a manual joint) (flat rows, newest first) joined with that welder's kept standing for the process (process_standings,
 * brought up to date first), so continuity is not re-read here. Flat rows, no per-row JSON.
 */
export async function coverageCandidates(db: Db, process: string): Promise<{ procedures: ProcedureRow[], welders: CandidateRow[] }> {
  await refreshStandings(db)
  const procedures = await db.execute(sql`
    select id, number, revision, title, code, edition, unit, ${process}::text as process,
           coalesce((select l->>'transfer' from jsonb_array_elements(layers) l where l->>'process' = ${process} limit 1), transfer) as transfer,
           p_number_a, p_number_b, thickness_min, thickness_max, diameter_min, positions, f_numbers
    from procedures where status = 'approved' and (process = ${process} or ${process} = any(processes)) order by number, revision`) as unknown as Rows<ProcedureRow>
  const tests = await db.execute(sql`
    select t.id, t.welder_id, t.test_date::text as test_date, t.code, t.edition, t.unit, ${process}::text as process,
           case when d.e is null then t.transfer else d.e->>'transfer' end as transfer, t.form, t.weld, t.coupon_thickness,
           case when d.e is null then t.deposit_thickness else (d.e->>'depositThickness')::float8 end as deposit_thickness, t.layers,
           t.outside_diameter, t.p_number, t.f_number, t.backing, t.positions, t.progression,
           w.name, w.stamp, s.code as chain_code, s.edition as chain_edition, s.test_date::text as chain_test_date,
           s.last_use::text as chain_last_use, s.lapses_on::text as chain_lapses_on, s.rule as chain_rule,
           s.revoked_on::text as revoked_on, s.revoked_reason, s.revoked_by
    from welder_tests t
      join welders w on w.id = t.welder_id
      join process_standings s on s.welder_id = t.welder_id and s.process = ${process}
      left join lateral (select e from jsonb_array_elements(t.deposits) e where e->>'process' = ${process} limit 1) d on true
    where t.status = 'certified' and t.qualified_as = 'welder' and (t.process = ${process} or ${process} = any(t.processes)) and w.status = 'active'
    order by w.stamp, t.test_date desc, t.id desc`) as unknown as Rows<TestRow & Record<'name' | 'stamp' | 'revoked_on' | 'revoked_reason' | 'revoked_by' | `chain_${'code' | 'edition' | 'test_date' | 'last_use' | 'lapses_on' | 'rule'}`, string> & { welder_id: number }>

  const welders = new Map<number, CandidateRow>()
  for (const row of tests.rows) {
    const { welder_id: welderId, name, stamp, chain_code: code, chain_edition: edition, chain_test_date: testDate, chain_last_use: lastUse, chain_lapses_on: lapsesOn, chain_rule: rule, revoked_on: revokedOn, revoked_reason: revokedReason, revoked_by: revokedBy, ...test } = row
    const id = Number(welderId)
    const candidate = welders.get(id) ?? { id, name, stamp, tests: [], chain: { process, code: code as CodeId, edition, testDate, lastUse, lapsesOn, rule, revoked: revokedOn ? { on: revokedOn, reason: revokedReason, by: revokedBy, clause: revocationClause[code as CodeId]?.revoke ?? 'QW-322.1(b)' } : null } }
    candidate.tests.push({ ...test, positions: parseArray(test.positions) })
    welders.set(id, candidate)
  }
  return { procedures: procedures.rows.map(p => ({ ...p, positions: parseArray(p.positions), f_numbers: parseArray(p.f_numbers) })), welders: [...welders.values()] }
}

/** node-postgres and PGlite both return text[] as arrays; a literal '{a,b}' is parsed for safety. */
function parseArray(value: string[] | string | null): string[] {
  if (Array.isArray(value)) return value
  if (!value || value === '{}') return []
  return value.replace(/^\{|\}$/g, '').split(',').map(s => s.replace(/^"|"$/g, ''))
}
