import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Worker } from 'node:worker_threads'
import { inArray, sql } from 'drizzle-orm'
import type { Db } from '../database/client'
import { welders } from '../database/schema'
import { parseImportCsv, type ParsedImport, type RowError } from './import-parse'

export interface CheckedImportRow { line: number, stamp: string, welderName: string, welderId: number, process: string, weldedOn: string, reference: string }

/** The worker bundled beside the built server entry (nuxt.config.ts); absent under `nuxt dev`, where it runs in-process. */
function workerFile() {
  const entry = process.argv[1]
  const file = entry ? join(dirname(entry), 'import-worker.cjs') : ''
  return file && existsSync(file) ? file : null
}

/** Parses and checks the CSV in a worker thread, so a 40,000-row file does not hold up other requests. */
export function parseImportOffThread(csv: string): Promise<ParsedImport> {
  const file = workerFile()
  if (!file) return Promise.resolve(parseImportCsv(csv))
  return new Promise((resolve, reject) => {
    const worker = new Worker(file, { workerData: { csv } })
    worker.once('message', (message: { result?: ParsedImport, error?: string }) => {
      if (message.result) resolve(message.result)
      else reject(new Error(message.error ?? 'the import check stopped'))
    })
    worker.once('error', reject)
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`the import check stopped (exit ${code})`))
    })
  })
}

/**
 * Parse and check a continuity CSV: the rows it would store and every row error, with its line number.
 * The same answer as checkImport in server/database/continuity.ts, with the parsing off the request thread.
 */
export async function checkImportOffThread(db: Db, csv: string, today: string): Promise<{ rows: CheckedImportRow[], errors: RowError[] }> {
  const parsed = await parseImportOffThread(csv)
  const errors = parsed.errors
  if (errors.some(e => e.field === 'header')) return { rows: [], errors }
  const stamps = [...new Set(parsed.stamps.map(s => s.toLowerCase()))]
  const roster = stamps.length
    ? await db.select({ id: welders.id, stamp: welders.stamp, name: welders.name }).from(welders).where(inArray(sql`lower(${welders.stamp})`, stamps))
    : []
  const byStamp = new Map(roster.map(w => [w.stamp.toLowerCase(), w]))
  const rows: CheckedImportRow[] = []
  const seen = new Set<string>()
  for (let i = 0; i < parsed.lines.length; i++) {
    const line = parsed.lines[i]!
    const [stamp, process, weldedOn, reference] = [parsed.stamps[i]!, parsed.processes[i]!, parsed.days[i]!, parsed.references[i]!]
    const welder = byStamp.get(stamp.toLowerCase())
    if (!welder) {
      errors.push({ line, field: 'stamp', message: `No welder with stamp ${stamp} on the roster` })
      continue
    }
    if (weldedOn > today) {
      errors.push({ line, field: 'weldedOn', message: `${weldedOn} is after today` })
      continue
    }
    const key = `${welder.id}|${process}|${weldedOn}|${reference}`
    if (seen.has(key)) {
      errors.push({ line, field: 'row', message: 'The same entry appears twice in the file' })
      continue
    }
    seen.add(key)
    rows.push({ line, stamp: welder.stamp, welderName: welder.name, welderId: welder.id, process, weldedOn, reference })
  }
  if (!rows.length && !errors.length) errors.push({ line: 1, field: 'file', message: 'The file has a header but no rows' })
  return { rows, errors: errors.sort((a, b) => a.line - b.line) }
}
