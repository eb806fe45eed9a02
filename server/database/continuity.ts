import { count, eq, gte, ilike, inArray, lte, or } from 'drizzle-orm'
import { standingsOf } from './standings'
import type { SessionUser } from '../utils/auth'
import { allOf, containsPattern, orderOf, pageOf } from '../utils/list'
import { fieldFailure, forbidden, invalid, missing, type Outcome } from '../../shared/types/outcome'
import type { ContinuityBulkInput, ContinuityEntryInput } from '../../shared/schemas/continuity-entry'
import type { ContinuityListQuery } from '../../shared/schemas/list-queries'
import type { Db } from './client'
import { accounts, continuityEntries, continuityImports, shopSettings, welders } from './schema'
import { recordAudit } from './audit'
import { checkImportOffThread } from '../workers/import-check'

export interface NewEntry { welderId: number, process: string, weldedOn: string, reference: string }
export type { RowError } from '../workers/import-parse'

export async function welderLogsOwnContinuity(db: Db) {
  const [settings] = await db.select({ allowed: shopSettings.welderLogsOwnContinuity }).from(shopSettings).where(eq(shopSettings.id, 1))
  return settings?.allowed ?? false
}

/** Ids among `ids` that are not on the roster. */
export async function missingWelders(db: Db, ids: number[]) {
  const found = await db.select({ id: welders.id }).from(welders).where(inArray(welders.id, ids))
  const known = new Set(found.map(w => w.id))
  return ids.filter(id => !known.has(id))
}

/** All entries in one transaction: every one is stored or none. An import is kept as one batch, to be undone whole. */
export async function insertEntries(db: Db, entries: NewEntry[], accountId: number, action: string) {
  return db.transaction(async (tx) => {
    const [batch] = action === 'import' ? await tx.insert(continuityImports).values({ importedBy: accountId, rows: entries.length }).returning({ id: continuityImports.id }) : []
    const rows = []
    // Chunks keep each statement under the parameter limit; the transaction keeps them all-or-nothing. Small chunks,
    // with a turn of the event loop between them, let an embedded database (which runs on this thread) answer other
    // requests while a large import is stored.
    for (let i = 0; i < entries.length; i += 25) {
      rows.push(...await tx.insert(continuityEntries).values(entries.slice(i, i + 25).map(e => ({ ...e, recordedBy: accountId, importId: batch?.id ?? null }))).returning({ id: continuityEntries.id }))
      await new Promise(resolve => setImmediate(resolve))
    }
    await recordAudit(tx as unknown as Db, {
      accountId, action, recordType: 'continuity', recordId: rows.length === 1 ? rows[0]!.id : null,
      after: entries.length <= 50 ? entries : { count: entries.length, first: entries[0], last: entries.at(-1) },
    })
    return rows.length
  })
}

/** Staff log continuity for anyone; a welder for themselves, and only when the shop allows it (403 otherwise). */
export async function mayLogContinuity(db: Db, user: SessionUser): Promise<Outcome<true>> {
  if (user.role === 'welder' && !await welderLogsOwnContinuity(db)) return forbidden('Your shop has continuity logged by the inspector or the quality manager')
  return true
}

/** One entry, checked against today and the roster; answers the welder's standings after it. */
export async function logEntry(db: Db, user: SessionUser, input: ContinuityEntryInput, today: string) {
  if (user.role === 'welder' && input.welderId !== user.welderId) return missing('Welder')
  if (input.weldedOn > today) return fieldFailure('weldedOn', 'The date is after today')
  if ((await missingWelders(db, [input.welderId])).length) return fieldFailure('welderId', 'No such welder on the roster')
  await insertEntries(db, [input], user.id, 'create')
  const standings = (await standingsOf(db, [input.welderId], today)).get(input.welderId) ?? []
  return { stored: 1, standings }
}

/** One process and date for many welders, all stored or none. */
export async function logBulk(db: Db, user: SessionUser, input: ContinuityBulkInput, today: string) {
  if (input.weldedOn > today) return fieldFailure('weldedOn', 'The date is after today')
  const unknown = await missingWelders(db, input.welderIds)
  if (unknown.length) return fieldFailure('welderIds', `Not on the roster: ${unknown.join(', ')}`)
  const stored = await insertEntries(db, input.welderIds.map(welderId => ({ welderId, process: input.process, weldedOn: input.weldedOn, reference: input.reference })), user.id, 'bulk')
  return { stored }
}

/** A CSV import: without `commit` the preview and row errors; with it every row in one transaction, or nothing when any row is wrong. */
export async function importLog(db: Db, user: SessionUser, csv: string, commit: boolean, today: string) {
  // The CSV is parsed and checked in a worker thread (server/workers/import-check.ts) against the roster read here.
  const roster = await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name }).from(welders)
  const { rows = [], ...summary } = await checkImportOffThread(roster, csv, today, commit)
  if (!commit) return { ...summary, stored: 0 }
  if (summary.errors.length) return invalid('body', [`${summary.errors.length} row error${summary.errors.length === 1 ? '' : 's'}: nothing was imported`], {}, summary.errors)
  const stored = await insertEntries(db, rows.map(({ welderId, process, weldedOn, reference }) => ({ welderId, process, weldedOn, reference })), user.id, 'import')
  return { ...summary, preview: [], stored }
}

const entrySortColumns = { weldedOn: continuityEntries.weldedOn, welder: welders.name, process: continuityEntries.process }

/** The continuity log, paged; a welder sees only their own entries. */
export async function listEntries(db: Db, user: SessionUser, query: ContinuityListQuery) {
  const where = allOf([
    user.role === 'welder' && eq(continuityEntries.welderId, user.welderId ?? -1),
    query.welderId && eq(continuityEntries.welderId, query.welderId),
    query.process && eq(continuityEntries.process, query.process),
    query.from && gte(continuityEntries.weldedOn, query.from),
    query.to && lte(continuityEntries.weldedOn, query.to),
    query.q && or(ilike(welders.name, containsPattern(query.q)), ilike(continuityEntries.reference, containsPattern(query.q))),
  ])
  return pageOf(query, ({ limit, offset }) => db.select({
    id: continuityEntries.id, weldedOn: continuityEntries.weldedOn, process: continuityEntries.process, reference: continuityEntries.reference,
    welderId: welders.id, welderName: welders.name, welderStamp: welders.stamp, recordedBy: accounts.name,
  }).from(continuityEntries).innerJoin(welders, eq(welders.id, continuityEntries.welderId)).leftJoin(accounts, eq(accounts.id, continuityEntries.recordedBy))
    .where(where).orderBy(orderOf(entrySortColumns[query.sort], query.dir), continuityEntries.id).limit(limit).offset(offset),
  () => db.select({ total: count() }).from(continuityEntries).innerJoin(welders, eq(welders.id, continuityEntries.welderId)).where(where))
}

/** Removes an entry logged by mistake (kept in the audit trail). */
export async function removeEntry(db: Db, user: SessionUser, id: number) {
  const removed = await db.transaction(async (tx) => {
    const [row] = await tx.delete(continuityEntries).where(eq(continuityEntries.id, id)).returning()
    if (row) await recordAudit(tx as unknown as Db, { accountId: user.id, action: 'delete', recordType: 'continuity', recordId: id, before: row })
    return row
  })
  return removed ?? missing('Entry')
}
