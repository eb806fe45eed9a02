import { DataDirLockedError } from '../database/lock'

/** Opens the database at start-up (see useDatabase), stops at once when that fails, closes it on shutdown. */
export default defineNitroPlugin((nitroApp) => {
  useDatabase()
    .catch((error: unknown) => {
      if (error instanceof DataDirLockedError) {
        console.error(`\n[rootface] ${error.message}\n`)
        process.exit(1)
      }
      console.error('[rootface] database start-up failed', error)
      process.exit(1)
    })
  nitroApp.hooks.hook('close', closeDatabase)
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.once(signal, () => {
      closeDatabase().finally(() => process.exit(0))
    })
  }
})
