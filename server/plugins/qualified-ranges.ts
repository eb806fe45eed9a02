import { analyzeTables, recomputeStaleQualifiedRanges } from '../database/qualified-ranges'

/**
 * At start-up, once the database is open: derive again the stored qualified ranges of another rules version (a release
 * changed the rules) and those of certified tests that have none yet (after the migration). Until a row is derived, its
 * test stays a candidate for every joint, so answers are right meanwhile, only slower. Then, on PGlite, the planner's
 * statistics are gathered.
 */
export default defineNitroPlugin(() => {
  useDatabase()
    .then(async (database) => {
      const derived = await recomputeStaleQualifiedRanges(database.db)
      if (derived > 0) console.info(`[rootface] qualified ranges derived for ${derived} test processes`)
      // PGlite has no autovacuum: its planner statistics are gathered here (a PostgreSQL server keeps its own).
      if (database.driver === 'pglite') await analyzeTables(database.db)
    })
    .catch((error: unknown) => console.error('[rootface] deriving the qualified ranges failed', error))
})
