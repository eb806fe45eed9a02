import { count, getTableColumns, is, sql } from 'drizzle-orm'
import { getTableConfig, PgTable } from 'drizzle-orm/pg-core'
import { refreshStandings } from './standings'
import type { Db } from './client'
import * as schema from './schema'
import { recordAudit } from './audit'
import type { SessionUser } from '../utils/auth'

// The way out: every record of the shop as tables of rows (CSV or XLSX per table), and one JSON archive of every table
// with the uploaded files inside, which loads into an empty database with nothing lost (scripts/db-import-records.ts).
// Column names are the database's own; values as stored (timestamps in ISO 8601 UTC, bytes as base64).

/** Kept out: the sign-in throttle (a counter of failures, not a record) and the queue of standings to recompute. */
const leftOut = new Set(['sign_in_failures', 'standing_refresh'])

export const archiveFormat = 'rootface-records'
export const archiveFormatVersion = 1

type AnyTable = PgTable
const tables: AnyTable[] = (Object.values(schema) as unknown[]).filter((v): v is AnyTable => is(v, PgTable))
const nameOf = (t: AnyTable) => getTableConfig(t).name

/** Every exported table, parents before children (foreign keys), so rows load in this order. */
export function exportedTables(): { name: string, table: AnyTable }[] {
  const kept = tables.filter(t => !leftOut.has(nameOf(t)))
  const parents = new Map(kept.map(t => [nameOf(t), new Set(getTableConfig(t).foreignKeys.map(fk => getTableConfig(fk.reference().foreignTable).name).filter(n => n !== nameOf(t)))]))
  const ordered: AnyTable[] = []
  const placed = new Set<string>()
  while (ordered.length < kept.length) {
    const next = kept.filter(t => !placed.has(nameOf(t)) && [...parents.get(nameOf(t))!].every(p => placed.has(p) || leftOut.has(p)))
    if (!next.length) throw new Error('the tables refer to each other in a circle')
    for (const t of next.sort((a, b) => nameOf(a).localeCompare(nameOf(b)))) {
      ordered.push(t)
      placed.add(nameOf(t))
    }
  }
  return ordered.map(t => ({ name: nameOf(t), table: t }))
}

export const exportedTableNames = () => exportedTables().map(t => t.name)

function tableNamed(name: string) {
  return exportedTables().find(t => t.name === name)?.table ?? null
}

/** A stored value as JSON: dates as ISO text, bytes as { base64 }. */
function jsonValue(value: unknown): unknown {
  if (value instanceof Date) return value.toISOString()
  if (value instanceof Uint8Array) return { base64: Buffer.from(value).toString('base64') }
  return value
}

/** The rows of one table with the database's column names, ordered by primary key columns. */
export async function tableRows(db: Db, name: string): Promise<{ columns: string[], rows: Record<string, unknown>[] } | null> {
  const table = tableNamed(name)
  if (!table) return null
  const columns = getTableColumns(table)
  const config = getTableConfig(table)
  const keys = config.columns.filter(c => c.primary).map(c => c)
  const pk = config.primaryKeys[0]?.columns ?? keys
  const rows = await db.select().from(table).orderBy(...(pk.length ? pk : config.columns.slice(0, 1)))
  const names = Object.entries(columns).map(([key, c]) => [key, c.name] as const)
  return {
    columns: names.map(([, n]) => n),
    rows: rows.map(r => Object.fromEntries(names.map(([key, n]) => [n, jsonValue((r as Record<string, unknown>)[key])]))),
  }
}

/** Each exported table with its row count. */
export async function tableCountsForExport(db: Db) {
  const result: { name: string, rows: number }[] = []
  for (const { name, table } of exportedTables()) {
    const [row] = await db.select({ n: count() }).from(table)
    result.push({ name, rows: row?.n ?? 0 })
  }
  return result
}

export interface ArchiveFile { storageKey: string, sha256: string, base64: string }
export interface RecordsArchive {
  format: typeof archiveFormat
  formatVersion: number
  exportedAt: string
  tables: Record<string, Record<string, unknown>[]>
  files: ArchiveFile[]
}

/** Every exported table and every uploaded file (read through `readFile`: disk or bucket). A file that is gone is listed with an empty body. */
export async function buildArchive(db: Db, readFile: (key: string) => Promise<Buffer | null>): Promise<RecordsArchive> {
  // The kept standings go out as they stand now: a change marked for recompute (standing_refresh is not exported) is
  // applied first, so the archive never carries a standing older than its own tests, confirmations and revocations.
  await refreshStandings(db)
  const out: RecordsArchive = { format: archiveFormat, formatVersion: archiveFormatVersion, exportedAt: new Date().toISOString(), tables: {}, files: [] }
  for (const { name } of exportedTables()) out.tables[name] = (await tableRows(db, name))!.rows
  for (const a of out.tables.attachments ?? []) {
    const key = String(a.storage_key)
    const bytes = await readFile(key)
    out.files.push({ storageKey: key, sha256: String(a.sha256), base64: bytes ? bytes.toString('base64') : '' })
  }
  return out
}

/** A value from the archive as the column stores it. */
function storedValue(column: { columnType: string, dataType: string }, value: unknown): unknown {
  if (value === null || value === undefined) return value ?? null
  if (column.columnType === 'PgTimestamp' && typeof value === 'string') return new Date(value)
  if (typeof value === 'object' && value !== null && 'base64' in value && column.columnType === 'PgCustomColumn') return new Uint8Array(Buffer.from(String((value as { base64: string }).base64), 'base64'))
  return value
}

export class ArchiveRefused extends Error {}

/**
 * Loads an archive into an empty database in one transaction, then sets every id sequence past the highest id, and
 * writes the files through `writeFile`. Refuses (ArchiveRefused) a database that holds any row of an exported table.
 */
export async function loadArchive(db: Db, archive: RecordsArchive, writeFile: (key: string, bytes: Buffer) => Promise<void>) {
  if (archive.format !== archiveFormat || archive.formatVersion !== archiveFormatVersion) throw new ArchiveRefused(`Not a ${archiveFormat} archive of version ${archiveFormatVersion}`)
  const unknown = Object.keys(archive.tables).filter(n => !tableNamed(n))
  if (unknown.length) throw new ArchiveRefused(`The archive has tables this version does not know: ${unknown.join(', ')}`)
  const counts = await tableCountsForExport(db)
  const filled = counts.filter(c => c.rows > 0).map(c => c.name)
  if (filled.length) throw new ArchiveRefused(`The database is not empty (${filled.join(', ')}); load an archive only into an empty one`)
  const loaded: Record<string, number> = {}
  await db.transaction(async (tx) => {
    for (const { name, table } of exportedTables()) {
      const rows = archive.tables[name] ?? []
      const columns = Object.entries(getTableColumns(table))
      const values = rows.map(r => Object.fromEntries(columns.filter(([, c]) => c.name in r).map(([key, c]) => [key, storedValue(c, r[c.name])])))
      // Rows go in small batches: a statement's parameters are limited.
      for (let i = 0; i < values.length; i += 200) await tx.insert(table).values(values.slice(i, i + 200) as never)
      loaded[name] = rows.length
      const serial = getTableConfig(table).columns.find(c => c.columnType === 'PgSerial')
      if (serial && rows.length) {
        await tx.execute(sql`select setval(pg_get_serial_sequence(${name}, ${serial.name}), (select max(${sql.identifier(serial.name)}) from ${sql.identifier(name)}))`)
      }
    }
  })
  let files = 0
  for (const f of archive.files) {
    if (!f.base64) continue
    await writeFile(f.storageKey, Buffer.from(f.base64, 'base64'))
    files++
  }
  return { tables: loaded, files }
}

/** The quality manager's export of every record as one archive, audited. */
export async function exportArchive(db: Db, user: Pick<SessionUser, 'id'>, readFile: (key: string) => Promise<Buffer | null>): Promise<RecordsArchive> {
  await recordAudit(db, { accountId: user.id, action: 'export.archive', recordType: 'shop' })
  return buildArchive(db, readFile)
}

/** One table's rows for a CSV or XLSX export, audited (null: no such table). */
export async function exportTable(db: Db, user: Pick<SessionUser, 'id'>, name: string, format: string) {
  const table = await tableRows(db, name)
  if (table) await recordAudit(db, { accountId: user.id, action: 'export.table', recordType: 'shop', after: { table: name, format, rows: table.rows.length } })
  return table
}
