// Times the weld-log CSV import on a fresh demo database: N open joints on the demo project KB-2611, each welded by
// two welders with SMAW, as a log of 2N lines; the preview (check only) and the commit. Invented data, deterministic.
// Usage: npx tsx scripts/time-weld-log-import.ts [lines=5000]
import { mkdtempSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { and, eq } from 'drizzle-orm'
import { openDatabase } from '../server/database/client'
import * as t from '../server/database/schema'
import { seedDemoShop } from '../server/database/seed/demo'
import { importWeldLog } from '../server/database/joints'

const lines = Number(process.argv[2] ?? 5000)
const dir = mkdtempSync(join(tmpdir(), 'rootface-weld-log-import-'))
const { db, close } = await openDatabase({ dataDir: join(dir, 'db'), holder: 'time-weld-log-import', afterMigrate: seedDemoShop })
try {
  const [project] = await db.select().from(t.projects).where(eq(t.projects.number, 'KB-2611'))
  const [wps] = await db.select().from(t.procedures).where(and(eq(t.procedures.number, 'KB-W02'), eq(t.procedures.revision, 1)))
  const crew = await db.select().from(t.welders).where(eq(t.welders.status, 'active'))
  const stamps = ['KB-04', 'KB-10'].map(s => crew.find(w => w.stamp === s)!)
  const [supervisor] = await db.select().from(t.accounts).where(eq(t.accounts.role, 'supervisor'))
  const joints = Math.ceil(lines / 2)
  const rows = Array.from({ length: joints }, (_, i) => ({
    projectId: project!.id, mark: `TIME-${String(i + 1).padStart(5, '0')}`, jointType: 'butt', weld: 'groove', unit: 'in', pNumberA: '1', pNumberB: '1',
    thickness: 0.5, outsideDiameter: 60, positions: ['F'], backing: true, rtPercent: 10, procedureId: wps!.id,
  }))
  const ids: number[] = []
  for (let i = 0; i < rows.length; i += 1000) ids.push(...(await db.insert(t.joints).values(rows.slice(i, i + 1000)).returning({ id: t.joints.id })).map(r => r.id))
  const assigned = ids.flatMap(jointId => stamps.map(w => ({ jointId, welderId: w.id, process: 'SMAW', layer: 'all', fNumber: 4, repair: 0 })))
  for (let i = 0; i < assigned.length; i += 2000) await db.insert(t.jointWelders).values(assigned.slice(i, i + 2000))
  const day = new Date(Date.now() - 86_400_000).toISOString().slice(0, 10)
  const today = new Date().toISOString().slice(0, 10)
  const csv = ['mark,stamp,process,date', ...rows.flatMap(r => stamps.map(w => `${r.mark},${w.stamp},SMAW,${day}`)).slice(0, lines)].join('\n')
  const user = { id: supervisor!.id, name: supervisor!.name, email: supervisor!.email, role: 'supervisor' as const, welderId: null }

  let started = performance.now()
  const preview = await importWeldLog(db, user, project!.id, csv, false, today)
  const previewMs = performance.now() - started
  if ('fail' in preview) throw new Error(JSON.stringify(preview))
  started = performance.now()
  const stored = await importWeldLog(db, user, project!.id, csv, true, today)
  const commitMs = performance.now() - started
  if ('fail' in stored) throw new Error(JSON.stringify(stored).slice(0, 2000))
  console.log(JSON.stringify({ lines: preview.total, joints: preview.joints, errors: preview.errors.length, firstError: preview.errors[0], stored: stored.stored, previewMs: Math.round(previewMs), commitMs: Math.round(commitMs) }))
}
finally {
  await close()
  rmSync(dir, { recursive: true, force: true })
}
