import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import dayjs from 'dayjs'
import { eq } from 'drizzle-orm'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { openDatabase, type Database } from '../../../../server/database/client'
import { processStandings, welders } from '../../../../server/database/schema'
import { chainOf, dashboard, refreshStandings } from '../../../../server/database/standings'
import { seedLargeShop } from '../../../../scripts/seed-large'
import { lapseWeeks } from '../../../../shared/qualification/lapse-weeks'
import { standingOn } from '../../../../shared/qualification/process-standing'

// The dashboard's counts, week buckets and lists come from aggregate queries over the kept standings; they must say what
// the shared rules say when every standing is read and judged one by one (standingOn, lapseWeeks).

let database: Database
let dir: string
const today = '2026-12-02'

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'rootface-dashboard-'))
  database = await openDatabase({ dataDir: join(dir, 'db'), holder: 'dashboard test' })
  await seedLargeShop(database.db, new Date(`${today}T12:00:00Z`), 0.02)
  await refreshStandings(database.db)
}, 240_000)

afterAll(async () => {
  await database?.close()
  if (dir) rmSync(dir, { recursive: true, force: true })
})

describe('dashboard from aggregate queries', () => {
  it('counts, week buckets and lists equal the standings judged one by one', async () => {
    const all = await database.db.select({ s: processStandings, name: welders.name, stamp: welders.stamp, status: welders.status })
      .from(processStandings).innerJoin(welders, eq(welders.id, processStandings.welderId))
    const rows = all.filter(r => r.status === 'active')
      .map(r => ({ ...standingOn(chainOf(r.s), today), welderId: r.s.welderId, welderName: r.name, welderStamp: r.stamp }))
      .sort((a, b) => a.lapsesOn.localeCompare(b.lapsesOn) || a.welderName.localeCompare(b.welderName) || a.welderStamp.localeCompare(b.welderStamp) || a.process.localeCompare(b.process))
    const answer = await dashboard(database.db, today)
    // Days left cross-checked with dayjs, not the date library the code uses.
    for (const r of answer.upcoming) expect(r.daysLeft).toBe(dayjs(r.lapsesOn).diff(dayjs(today), 'day'))
    const lapsed = rows.filter(r => r.daysLeft <= 0)
    const upcoming = rows.filter(r => r.daysLeft > 0 && r.daysLeft <= 90)
    expect(lapsed.length).toBeGreaterThan(0)
    expect(upcoming.length).toBeGreaterThan(0)
    expect(answer.lapsedCount).toBe(lapsed.length)
    expect(answer.upcomingCounts).toEqual({ 30: upcoming.filter(r => r.daysLeft <= 30).length, 60: upcoming.filter(r => r.daysLeft <= 60).length, 90: upcoming.length })
    expect(answer.currentCount).toBe(rows.filter(r => r.daysLeft > 30).length)
    expect(answer.upcoming).toEqual(upcoming.slice(0, 25)) // the dashboard lists the first 25 and counts them all
    expect(answer.lapsed.map(r => `${r.welderStamp} ${r.process}`)).toEqual([...lapsed].reverse().slice(0, 25).map(r => `${r.welderStamp} ${r.process}`))
    expect(answer.timeline).toEqual(lapseWeeks(rows, today))
  })
})
