import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Worker } from 'node:worker_threads'
import { checkImportCsv, type CheckedImport, type RosterEntry } from './import-parse'

export type { CheckedImport, CheckedImportRow, RowError } from './import-parse'

/** The worker bundled beside the built server entry (nuxt.config.ts); absent under `nuxt dev`, where it runs in-process. */
function workerFile() {
  const entry = process.argv[1]
  const file = entry ? join(dirname(entry), 'import-worker.cjs') : ''
  return file && existsSync(file) ? file : null
}

/**
 * Parses and checks a continuity CSV in a worker thread, so a 40,000-row file does not hold up other requests:
 * the row count, the welders named, every row error with its line, the first rows for the preview, and, with
 * `withRows`, every row to store. The caller reads the roster (server/database/continuity.ts) and it is handed to the worker.
 */
export async function checkImportOffThread(roster: RosterEntry[], csv: string, today: string, withRows: boolean): Promise<CheckedImport> {
  const file = workerFile()
  if (!file) return checkImportCsv(csv, roster, today, withRows)
  return new Promise((resolve, reject) => {
    const worker = new Worker(file, { workerData: { csv, roster, today, withRows } })
    worker.once('message', (message: { result?: CheckedImport, error?: string }) => {
      if (message.result) resolve(message.result)
      else reject(new Error(message.error ?? 'the import check stopped'))
    })
    worker.once('error', reject)
    worker.once('exit', (code) => {
      if (code !== 0) reject(new Error(`the import check stopped (exit ${code})`))
    })
  })
}
