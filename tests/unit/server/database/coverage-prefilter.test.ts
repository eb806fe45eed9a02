import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { sql } from 'drizzle-orm'
import fc from 'fast-check'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openDatabase, type Database } from '../../../../server/database/client'
import { whoCanWeld } from '../../../../server/database/coverage'
import { recomputeStaleQualifiedRanges } from '../../../../server/database/qualified-ranges'
import { welderTests } from '../../../../server/database/schema'
import { refreshStandings } from '../../../../server/database/standings'
import { seedLargeShop } from '../../../../scripts/seed-large'
import { resolveJoint, type ResolvedJoint } from '../../../../shared/qualification/joint-coverage'
import { getRuleSet } from '../../../../shared/rules'
import { jointSchema } from '../../../../shared/schemas/coverage'

// The stored qualified ranges may only drop a test the rules would find not covered: "Who can weld it?" filtered in SQL
// must give exactly the answer of the rules run on every candidate (covered, cannot tell and not covered alike, with the
// same findings, lists and counts). Checked over random joints on a small large-shop seed plus tests of every shape.

const processes = ['SMAW', 'GTAW', 'GMAW', 'FCAW'] as const
// Test positions as the coupon records them (ASME IX QW-461.4, QW-461.5; common practice for the others).
const positionsOf = { 'groove-plate': ['1G', '2G', '3G', '4G'], 'groove-pipe': ['1G', '2G', '5G', '6G'], 'fillet-plate': ['1F', '2F', '3F', '4F'], 'fillet-pipe': ['1F', '2F', '4F', '5F'] }

/** A welder test of any shape: some values left out, some in mm, some to another code. */
const testArb = fc.record({
  code: fc.constantFrom('asme-ix', 'asme-ix', 'asme-ix', 'asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'),
  unit: fc.constantFrom('in', 'in', 'mm'),
  process: fc.constantFrom(...processes),
  transfer: fc.constantFrom(null, 'short-circuit', 'spray', 'pulse'),
  form: fc.constantFrom('plate', 'pipe'),
  weld: fc.constantFrom('groove', 'groove', 'fillet'),
  thickness: fc.constantFrom(null, 0.0625, 0.125, 0.1875, 0.25, 0.375, 0.5, 0.75, 1, 3, 6, 10, 13, 25),
  deposit: fc.boolean(),
  layers: fc.constantFrom(null, 1, 2, 3, 4),
  outsideDiameter: fc.constantFrom(null, 1, 1.315, 2.875, 4.5, 24, 30, 60, 73, 610),
  fNumber: fc.constantFrom(null, '1', '3', '4', '5', '6'),
  backing: fc.boolean(),
  progression: fc.constantFrom(null, 'uphill', 'downhill'),
  positionCount: fc.integer({ min: 1, max: 2 }),
  pick: fc.integer({ min: 0, max: 3 }),
})

/** A joint as the form sends it, left short in any field. */
const jointArb = fc.record({
  code: fc.constantFrom(undefined, 'asme-ix', 'asme-ix', 'aws-d1.1', 'iso-9606-1', 'aws-d1.3'),
  process: fc.constantFrom(...processes, 'SAW'),
  transfer: fc.constantFrom(undefined, 'short-circuit', 'spray', 'globular'),
  unit: fc.constantFrom('in', 'in', 'mm'),
  pNumber: fc.constantFrom(undefined, '1', '8'),
  thickness: fc.constantFrom(undefined, 0.0625, 0.125, 0.2, 0.25, 0.375, 0.5, 0.75, 1, 2, 4, 12, 19.05, 50),
  form: fc.constantFrom('plate', 'pipe'),
  outsideDiameter: fc.constantFrom(1, 2, 2.875, 3, 4.5, 24, 25, 73, 600, 610, 620),
  weld: fc.constantFrom('groove', 'groove', 'fillet'),
  positions: fc.subarray(['F', 'H', 'V', 'O'], { minLength: 1 }),
  progression: fc.constantFrom(undefined, 'uphill', 'downhill'),
  fNumber: fc.constantFrom(undefined, 1, 3, 4, 5, 6, 43),
  backing: fc.constantFrom(undefined, true, false),
  fillerAdded: fc.constantFrom(undefined, true),
  current: fc.constantFrom(undefined, 'DCEN'),
})

let database: Database
let dir: string
const today = '2026-12-02'

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'rootface-prefilter-'))
  database = await openDatabase({ dataDir: join(dir, 'db'), holder: 'coverage prefilter test' })
  const db = database.db
  await seedLargeShop(db, new Date(`${today}T12:00:00Z`), 0.04)
  const ids = (await db.execute<{ id: number }>(sql`select id from welders where status = 'active' order by id limit 40`)).rows.map(r => Number(r.id))
  const extra = fc.sample(testArb, { seed: 20261202, numRuns: 400 }).map((t, i) => {
    const kind = `${t.weld}-${t.form}` as keyof typeof positionsOf
    const positions = positionsOf[kind].slice(t.pick, t.pick + t.positionCount)
    const size = (v: number | null) => (v === null ? null : t.unit === 'mm' && v < 5 ? v * 25.4 : v)
    return {
      welderId: ids[i % ids.length]!, testDate: '2026-06-01', code: t.code, edition: getRuleSet(t.code as 'asme-ix').defaultEdition, unit: t.unit,
      process: t.process, transfer: t.transfer, form: t.form, weld: t.weld, couponThickness: size(t.thickness), depositThickness: t.deposit ? size(t.thickness) : null,
      layers: t.layers, outsideDiameter: t.form === 'pipe' ? size(t.outsideDiameter) : null, pNumber: '1', fNumber: t.fNumber, backing: t.backing,
      positions: positions.length ? positions : [positionsOf[kind][0]!], progression: t.progression, status: 'certified', processes: [t.process],
      deposits: [{ process: t.process, transfer: t.transfer, depositThickness: t.deposit ? size(t.thickness) : null }],
    }
  })
  await db.insert(welderTests).values(extra)
  await refreshStandings(db)
  await recomputeStaleQualifiedRanges(db)
}, 240_000)

afterAll(async () => {
  await database?.close()
  if (dir) rmSync(dir, { recursive: true, force: true })
})

const withoutTiming = ({ timing: _timing, ...answer }: Awaited<ReturnType<typeof whoCanWeld>>) => answer

describe('"Who can weld it?" on the stored qualified ranges', () => {
  it('every certified test has its ranges derived by the current rules version', async () => {
    const missing = await database.db.execute<{ n: number }>(sql`
      select count(*)::int as n from welder_tests t where t.status = 'certified'
        and not exists (select 1 from qualified_ranges r where r.test_id = t.id and r.process = t.process)`)
    expect(Number(missing.rows[0]!.n)).toBe(0)
    const dropped = await database.db.execute<{ n: number }>(sql`select count(*)::int as n from qualified_ranges where derived`)
    expect(Number(dropped.rows[0]!.n)).toBeGreaterThan(100)
  })

  it('filtered in SQL, the answer is the rules\' answer on every candidate (property over random joints)', async () => {
    let droppedSome = 0
    let fromRanges = 0
    await fc.assert(fc.asyncProperty(jointArb, async (raw) => {
      const parsed = jointSchema.safeParse({ ...raw, outsideDiameter: raw.form === 'pipe' ? raw.outsideDiameter : undefined })
      if (!parsed.success) return
      const joint = resolveJoint(parsed.data) as ResolvedJoint
      // A short list of welders not covered, so the list merges judged and left-out welders in stamp order.
      const fast = await whoCanWeld(database.db, joint, today, { listed: 5 })
      const full = await whoCanWeld(database.db, joint, today, { prefilter: false, listed: 5 })
      if (fast.timing.ruledOut > 0) droppedSome++
      if (fast.timing.coupons > 0) fromRanges++
      expect(withoutTiming(fast)).toEqual(withoutTiming(full))
    }), { numRuns: 150, seed: 4242 })
    // The filter is not idle: most joints leave welders out before the rules run.
    expect(droppedSome).toBeGreaterThan(50)
    // and the answer came from the stored coupons (not the fallback that judges every candidate)
    expect(fromRanges).toBeGreaterThan(100)
  }, 240_000)

  it('a covered, a cannot-tell and a not-covered answer all occur among the joints tried', async () => {
    const joint = resolveJoint(jointSchema.parse({ process: 'SMAW', positions: 'F', weld: 'groove', form: 'plate', thickness: 0.25, code: 'asme-ix', unit: 'in', pNumber: '1', fNumber: 4, backing: true })) as ResolvedJoint
    const answer = await whoCanWeld(database.db, joint, today)
    expect(answer.welders.able.length + answer.welders.lapsedCount).toBeGreaterThan(0)
    expect(answer.welders.notCoveredCount).toBeGreaterThan(0)
    const short = resolveJoint(jointSchema.parse({ process: 'SMAW', positions: 'F', weld: 'groove', form: 'plate', code: 'asme-ix', unit: 'in' })) as ResolvedJoint
    expect((await whoCanWeld(database.db, short, today)).welders.undecidedCount).toBeGreaterThan(0)
  })

  it('rows of another rules version are not trusted until derived again, then filter again', async () => {
    const db = database.db
    const joint = resolveJoint(jointSchema.parse({ process: 'GMAW', positions: 'V', weld: 'groove', form: 'plate', thickness: 0.25, unit: 'in', fNumber: 6 })) as ResolvedJoint
    const full = withoutTiming(await whoCanWeld(db, joint, today, { prefilter: false }))
    // As an older release might have left them: stamped with another version and saying the test qualifies nothing.
    await db.execute(sql`update qualified_ranges set rules_version = rules_version - 1, positions_groove = '{}', positions_groove_pipe = '{}', positions_fillet = '{}', deposit_max_micro = 1`)
    const stale = await whoCanWeld(db, joint, today)
    expect(stale.timing.ruledOut).toBe(0)
    expect(withoutTiming(stale)).toEqual(full)
    expect(await recomputeStaleQualifiedRanges(db)).toBeGreaterThan(0)
    const fresh = await whoCanWeld(db, joint, today)
    expect(fresh.timing.ruledOut).toBeGreaterThan(0)
    expect(withoutTiming(fresh)).toEqual(full)
  })
})
