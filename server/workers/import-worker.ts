import { parentPort, workerData } from 'node:worker_threads'
import { checkImportCsv, type RosterEntry } from './import-parse'

// Entry of the continuity-import worker (bundled to import-worker.cjs at build time): CSV text and roster in, checked rows out.
const input = workerData as { csv: string, roster: RosterEntry[], today: string, withRows: boolean }
try {
  parentPort!.postMessage({ result: checkImportCsv(input.csv, input.roster, input.today, input.withRows) })
}
catch (error) {
  parentPort!.postMessage({ error: error instanceof Error ? error.message : String(error) })
}
