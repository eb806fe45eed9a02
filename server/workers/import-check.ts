import { existsSync } from 'node:fs'
import { dirname, join } from 'node:path'
import { Worker } from 'node:worker_threads'
import { parseImportCsv, type ParsedImport } from './import-parse'

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
