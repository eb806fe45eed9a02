import { mkdtempSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { PGlite } from '@electric-sql/pglite'
import { afterAll, describe, expect, it } from 'vitest'
import { QUALIFIED_RANGES_RULES_VERSION } from '../../shared/qualification/qualified-ranges'
import { removeDir, signedIn, startServer, type TestServer } from './harness'

/**
 * The stored qualified ranges follow the rules: every certified test has them, stamped with the rules version; rows of
 * another version (a release changed the rules) or missing rows are derived again at start-up, and meanwhile they never
 * leave a welder out of "Who can weld it?".
 */
const dir = mkdtempSync(join(tmpdir(), 'rootface-ranges-'))
let server: TestServer | undefined
afterAll(async () => {
  await server?.stop()
  removeDir(dir)
})

async function withDb<T>(work: (db: PGlite) => Promise<T>) {
  const db = await PGlite.create(join(dir, 'db'))
  try {
    return await work(db)
  }
  finally {
    await db.close()
  }
}

// Joints the demo shop has covered, cannot-tell and not-covered welders for (stated fully, and left short).
const joints = [
  'process=SMAW&unit=in&pNumber=1&thickness=0.5&form=plate&weld=groove&position=V&fNumber=4&backing=true&progression=uphill',
  'process=SMAW&thickness=0.25&position=V',
  'process=GTAW&unit=in&pNumber=1&thickness=0.25&form=pipe&outsideDiameter=2.375&weld=groove&positions=F,V,O&fNumber=6&backing=false',
  'process=GMAW&unit=mm&pNumber=1&thickness=6&form=plate&weld=fillet&position=O&transfer=short-circuit',
]

async function answers(s: TestServer) {
  const supervisor = await signedIn(s.url, 'supervisor')
  const out: unknown[] = []
  for (const joint of joints) {
    const res = await supervisor.json<{ timing: unknown, today: string }>(`/api/coverage?${joint}`)
    expect(res.status, joint).toBe(200)
    const { timing: _timing, ...answer } = res.body
    out.push(answer)
  }
  return out
}

describe('stored qualified ranges', () => {
  it('are derived for every certified test, and derived again at start-up when stale, without changing an answer', async () => {
    server = await startServer({ dataDir: dir })
    const before = await answers(server)
    await server.stop()

    const state = await withDb(async (db) => {
      const certified = Number((await db.query<{ n: number }>(`select count(*)::int as n from welder_tests where status = 'certified'`)).rows[0]!.n)
      const current = Number((await db.query<{ n: number }>(`select count(distinct test_id)::int as n from qualified_ranges where rules_version = ${QUALIFIED_RANGES_RULES_VERSION}`)).rows[0]!.n)
      // Made stale as an older release would have left them, and wrong: no positions, a deposit of 1 micro-unit. One test loses its rows.
      await db.exec(`update qualified_ranges set rules_version = ${QUALIFIED_RANGES_RULES_VERSION - 1}, positions_groove = '{}', positions_groove_pipe = '{}',
        positions_fillet = '{}', deposit_max_micro = 1, diameter_min_micro = 1000000000`)
      await db.exec(`delete from qualified_ranges where test_id = (select min(test_id) from qualified_ranges)`)
      await db.exec('delete from qualified_ranges_refresh')
      return { certified, current }
    })
    expect(state.certified).toBeGreaterThan(0)
    expect(state.current).toBe(state.certified)

    server = await startServer({ dataDir: dir })
    // Until start-up has derived them again, stale rows keep their tests candidates: the answers are the same.
    expect(await answers(server)).toEqual(before)
    for (let i = 0; i < 100 && !/qualified ranges derived for \d+/.test(server.output()); i++) await new Promise(r => setTimeout(r, 100))
    expect(server.output()).toMatch(/qualified ranges derived for \d+ test processes/)
    expect(await answers(server)).toEqual(before)
    await server.stop()

    await withDb(async (db) => {
      const stale = (await db.query<{ n: number }>(`select count(*)::int as n from qualified_ranges where rules_version <> ${QUALIFIED_RANGES_RULES_VERSION} or deposit_max_micro = 1`)).rows[0]!.n
      expect(Number(stale)).toBe(0)
      const missing = (await db.query<{ n: number }>(`select count(*)::int as n from welder_tests t where status = 'certified' and not exists (select 1 from qualified_ranges r where r.test_id = t.id)`)).rows[0]!.n
      expect(Number(missing)).toBe(0)
    })
    server = undefined
  }, 180_000)
})
