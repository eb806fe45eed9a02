import Papa from 'papaparse'
import { eq, inArray, sql } from 'drizzle-orm'
import type { Db } from './client'
import { continuityEntries, shopSettings, welders } from './schema'
import { continuityImportRowSchema, importHeaders } from '../../shared/schemas/continuity'
import { recordAudit } from '../utils/audit'

export interface NewEntry { welderId: number, process: string, weldedOn: string, reference: string }
export interface RowError { line: number, field: string, message: string }
export interface ImportRow extends NewEntry { line: number, stamp: string, welderName: string }

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

/** All entries in one transaction: every one is stored or none. */
export async function insertEntries(db: Db, entries: NewEntry[], accountId: number, action: string) {
  return db.transaction(async (tx) => {
    const rows = []
    // Chunks keep each statement under the parameter limit; the transaction keeps them all-or-nothing. Small chunks,
    // with a turn of the event loop between them, let an embedded database (which runs on this thread) answer other
    // requests while a large import is stored.
    for (let i = 0; i < entries.length; i += 25) {
      rows.push(...await tx.insert(continuityEntries).values(entries.slice(i, i + 25).map(e => ({ ...e, recordedBy: accountId }))).returning({ id: continuityEntries.id }))
      await new Promise(resolve => setImmediate(resolve))
    }
    await recordAudit(tx as unknown as Db, {
      accountId, action, recordType: 'continuity', recordId: rows.length === 1 ? rows[0]!.id : null,
      after: entries.length <= 50 ? entries : { count: entries.length, first: entries[0], last: entries.at(-1) },
    })
    return rows.length
  })
}

const normal = (h: string) => h.trim().toLowerCase().replace(/[_\s]+/g, ' ')

/** Parse and check a continuity CSV: the rows it would store and every row error, with its line number. */
export async function checkImport(db: Db, csv: string, today: string): Promise<{ rows: ImportRow[], errors: RowError[] }> {
  const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), {
    header: true, delimiter: ',', skipEmptyLines: 'greedy', transformHeader: normal,
  })
  const errors: RowError[] = []
  const fields = parsed.meta.fields ?? []
  const column = Object.fromEntries(Object.entries(importHeaders).map(([key, names]) => [key, fields.find(f => names.includes(f))]))
  const missing = Object.entries(column).filter(([, f]) => !f).map(([k]) => importHeaders[k as keyof typeof importHeaders][0])
  if (missing.length) return { rows: [], errors: [{ line: 1, field: 'header', message: `The first line must name the columns; missing: ${missing.join(', ')}` }] }
  for (const e of parsed.errors) errors.push({ line: (e.row ?? 0) + 2, field: 'row', message: e.message })

  const stamps = [...new Set(parsed.data.map(r => (r[column.stamp!] ?? '').trim().toLowerCase()).filter(Boolean))]
  const roster = stamps.length
    ? await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name }).from(welders).where(inArray(sql`lower(${welders.stamp})`, stamps))
    : []
  const byStamp = new Map(roster.map(w => [w.stamp.toLowerCase(), w]))
  const rows: ImportRow[] = []
  const seen = new Set<string>()
  parsed.data.forEach((raw, i) => {
    const line = i + 2
    const result = continuityImportRowSchema.safeParse({
      stamp: raw[column.stamp!], process: raw[column.process!], weldedOn: raw[column.weldedOn!]?.trim(), reference: raw[column.reference!],
    })
    if (!result.success) {
      for (const [field, messages] of Object.entries(result.error.flatten().fieldErrors)) errors.push({ line, field, message: messages?.[0] ?? 'Invalid' })
      return
    }
    const r = result.data
    const welder = byStamp.get(r.stamp.toLowerCase())
    if (!welder) return errors.push({ line, field: 'stamp', message: `No welder with stamp ${r.stamp} on the roster` })
    if (r.weldedOn > today) return errors.push({ line, field: 'weldedOn', message: `${r.weldedOn} is after today` })
    const key = `${welder.id}|${r.process}|${r.weldedOn}|${r.reference}`
    if (seen.has(key)) return errors.push({ line, field: 'row', message: 'The same entry appears twice in the file' })
    seen.add(key)
    rows.push({ line, stamp: welder.stamp, welderName: welder.name, welderId: welder.id, process: r.process, weldedOn: r.weldedOn, reference: r.reference })
  })
  if (!rows.length && !errors.length) errors.push({ line: 1, field: 'file', message: 'The file has a header but no rows' })
  return { rows, errors: errors.sort((a, b) => a.line - b.line) }
}
