import { parentPort, workerData } from 'node:worker_threads'
import { parseImportCsv } from './import-parse'

// Entry of the continuity-import worker (bundled to import-worker.cjs at build time): CSV text in, checked rows out.
try {
  parentPort!.postMessage({ result: parseImportCsv((workerData as { csv: string }).csv) })
}
catch (error) {
  parentPort!.postMessage({ error: error instanceof Error ? error.message : String(error) })
}
