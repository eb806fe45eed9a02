import { and, desc, eq, sql } from 'drizzle-orm'
import { alias } from 'drizzle-orm/pg-core'
import { addDays, format } from 'date-fns'
import type { SessionUser } from '../utils/auth'
import { conflict, frozen, missing, type Outcome } from '../../shared/types/outcome'
import { importUndoDays } from '../../shared/schemas/continuity-entry'
import type { Db } from './client'
import { accounts, continuityEntries, continuityImports } from './schema'
import { recordAudit } from './audit'

// The committed CSV imports of the continuity domain (server/database/continuity.ts stores them) and their undo.

type Batch = typeof continuityImports.$inferSelect

/**
 * What rests on an import, so that undoing it would change what someone already relied on:
 * - entries stored after it for a welder and process it touched, welded on or after its first date for that pair
 *   (the continuity chain runs forward: such a use may only count because an imported use kept the welder current);
 * - continuity logs issued after it for a welder it touched whose period reaches its first date for that welder
 *   (the issued sheet would no longer verify "unchanged").
 */
async function dependents(db: Db, batch: Batch): Promise<{ entries: number, logs: number }> {
  const [later] = (await db.execute(sql`
    with touched as (
      select welder_id, process, min(welded_on) as first from continuity_entries where import_id = ${batch.id} group by welder_id, process)
    select
      (select count(*)::int from continuity_entries e join touched t on t.welder_id = e.welder_id and t.process = e.process and e.welded_on >= t.first
        where e.import_id is distinct from ${batch.id} and e.created_at > ${batch.createdAt.toISOString()}::timestamptz) as entries,
      (select count(*)::int from issued_sheets s
        join (select welder_id, min(first) as first from touched group by welder_id) w on w.welder_id = s.welder_id and s.period_to >= w.first
        where s.kind = 'continuity-log' and s.issued_at > ${batch.createdAt.toISOString()}::timestamptz) as logs`) as unknown as { rows: { entries: number, logs: number }[] }).rows
  return { entries: Number(later?.entries ?? 0), logs: Number(later?.logs ?? 0) }
}

/** The last day an import may be undone, and why it may not be now (null: it may). */
async function undoBlock(db: Db, batch: Batch, now: Date): Promise<{ why: string, kind: 'undone' | 'window' | 'depends' } | null> {
  if (batch.undoneAt) return { kind: 'undone', why: `Already undone on ${format(batch.undoneAt, 'yyyy-MM-dd HH:mm')}.` }
  const until = addDays(batch.createdAt, importUndoDays)
  if (now > until) return { kind: 'window', why: `An import can be undone for ${importUndoDays} days after it was stored; this one could be until ${format(until, 'yyyy-MM-dd HH:mm')}. Remove single entries instead.` }
  const { entries, logs } = await dependents(db, batch)
  if (entries || logs) {
    const parts = [
      entries ? `${entries} entr${entries === 1 ? 'y' : 'ies'} logged since for the same welders and processes` : '',
      logs ? `${logs} continuity log${logs === 1 ? '' : 's'} issued since for these welders` : '',
    ].filter(Boolean)
    return { kind: 'depends', why: `Later records rest on this import: ${parts.join(' and ')}. Remove single entries instead.` }
  }
  return null
}

const importer = alias(accounts, 'importer')
const undoer = alias(accounts, 'undoer')

/** The latest committed imports, newest first, each with whether it may still be undone and why not. */
export async function recentImports(db: Db, now: Date, limit = 20) {
  const rows = await db.select({ batch: continuityImports, importedByName: importer.name, undoneByName: undoer.name })
    .from(continuityImports).leftJoin(importer, eq(importer.id, continuityImports.importedBy)).leftJoin(undoer, eq(undoer.id, continuityImports.undoneBy))
    .orderBy(desc(continuityImports.createdAt), desc(continuityImports.id)).limit(limit)
  const items = []
  for (const { batch, importedByName, undoneByName } of rows) {
    const block = await undoBlock(db, batch, now)
    items.push({
      id: batch.id, rows: batch.rows, at: batch.createdAt.toISOString(), by: importedByName, undoneAt: batch.undoneAt?.toISOString() ?? null, undoneBy: undoneByName,
      undoUntil: addDays(batch.createdAt, importUndoDays).toISOString(), mayUndo: block === null, whyNot: block?.why ?? null,
    })
  }
  return { undoDays: importUndoDays, items }
}

/**
 * Undoes a committed import as a whole: removes every entry it stored, in one transaction, and keeps them in the
 * audit trail. Refused (409) once undone, after the window, or when later records rest on it (see `dependents`).
 */
export async function undoImport(db: Db, user: SessionUser, id: number, now: Date): Promise<Outcome<{ id: number, removed: number }>> {
  const [batch] = await db.select().from(continuityImports).where(eq(continuityImports.id, id))
  if (!batch) return missing('Import')
  const block = await undoBlock(db, batch, now)
  if (block?.kind === 'window') return frozen(block.why)
  if (block) return conflict(block.why)
  return db.transaction(async (tx) => {
    const t = tx as unknown as Db
    // Claim the import first: of two undos at once, the second finds it undone and changes nothing.
    const [claimed] = await t.update(continuityImports).set({ undoneAt: now, undoneBy: user.id })
      .where(and(eq(continuityImports.id, id), sql`${continuityImports.undoneAt} is null`)).returning({ id: continuityImports.id })
    if (!claimed) return conflict('Already undone.')
    const removed = await t.delete(continuityEntries).where(eq(continuityEntries.importId, id))
      .returning({ id: continuityEntries.id, welderId: continuityEntries.welderId, process: continuityEntries.process, weldedOn: continuityEntries.weldedOn, reference: continuityEntries.reference })
    await recordAudit(t, {
      accountId: user.id, action: 'import-undo', recordType: 'continuity-import', recordId: id,
      before: removed.length <= 50 ? { entries: removed } : { count: removed.length, first: removed[0], last: removed.at(-1) },
      after: { undoneAt: now.toISOString() },
    })
    return { id, removed: removed.length }
  })
}
