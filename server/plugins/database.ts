import { DataDirLockedError } from '../database/lock'
import { seedDemoShop } from '../database/seed/demo'

/** Opens the database at start-up, seeds the demo shop into an empty one, closes it on shutdown. */
export default defineNitroPlugin((nitroApp) => {
  const config = useRuntimeConfig()
  useDatabase()
    .then(async ({ db }) => {
      if (String(config.seedDemo) !== 'false') await seedDemoShop(db)
    })
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
