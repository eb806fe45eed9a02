import { recomputeStaleQualifiedRanges } from '../database/qualified-ranges'

/**
 * At start-up, once the database is open: derive again the stored qualified ranges of another rules version (a release
 * changed the rules) and those of certified tests that have none yet (after the migration). Until a row is derived, its
 * test stays a candidate for every joint, so answers are right meanwhile, only slower.
 */
export default defineNitroPlugin(() => {
  useDatabase()
    .then(database => recomputeStaleQualifiedRanges(database.db))
    .then((derived) => {
      if (derived > 0) console.info(`[rootface] qualified ranges derived for ${derived} test processes`)
    })
    .catch((error: unknown) => console.error('[rootface] deriving the qualified ranges failed', error))
})
