import { eq, sql } from 'drizzle-orm'
import type { Db } from './client'
import { signInFailures } from './schema'
import { delayForAttempt, LOCK_MINUTES, WINDOW_MINUTES, type Reservation, type Reserve, type ThrottleKey } from '../utils/sign-in-throttle'

// The sign-in throttle's counts (sign_in_failures). The rules (limits, waits, keys, client address) are in
// server/utils/sign-in-throttle.ts; the sign-in route (server/api/auth/[...].ts) calls these around each attempt.

/** Counts this attempt against every key, or refuses it when a key is locked or already at its limit. */
export async function reserveSignIn(db: Db, keys: ThrottleKey[]): Promise<Reserve> {
  return db.transaction(async (tx) => {
    let attempt = 0
    let refusedUntil = null as Date | null
    const taken: string[] = []
    for (const { key, limit } of keys) {
      // One statement makes the row exist and locks it: an insert that met a row and a select after it could find the row
      // deleted in between by a concurrent successful sign-in (seen on PostgreSQL with twenty sign-ins at once).
      const [row] = await tx.insert(signInFailures).values({ key, failures: 0 })
        .onConflictDoUpdate({ target: signInFailures.key, set: { key: sql`excluded.key` } })
        .returning()
      const now = new Date()
      if (row!.lockedUntil && row!.lockedUntil > now) {
        refusedUntil = refusedUntil && refusedUntil > row!.lockedUntil ? refusedUntil : row!.lockedUntil
        continue
      }
      const stale = now.getTime() - row!.lastFailureAt.getTime() > WINDOW_MINUTES * 60_000 || (row!.lockedUntil && row!.lockedUntil <= now)
      const before = stale ? 0 : row!.failures
      if (before >= limit) {
        // Attempts in flight already reached the limit: refuse without waiting for them to fail.
        refusedUntil = new Date(now.getTime() + 60_000)
        continue
      }
      attempt = Math.max(attempt, before + 1)
      taken.push(key)
      await tx.update(signInFailures).set({ failures: before + 1, lastFailureAt: sql`now()`, lockedUntil: null }).where(eq(signInFailures.key, key))
    }
    if (refusedUntil) {
      // Give back what this attempt took from the other keys.
      for (const key of taken) {
        await tx.update(signInFailures).set({ failures: sql`greatest(${signInFailures.failures} - 1, 0)` }).where(eq(signInFailures.key, key))
      }
      return { ok: false, retryAfterSeconds: Math.max(1, Math.ceil((refusedUntil.getTime() - Date.now()) / 1000)) }
    }
    return { ok: true, reservation: { keys, attempt }, delayMs: delayForAttempt(attempt) }
  })
}

/** The attempt failed: keys that reached their limit are locked. Returns whether the account key was locked now. */
export async function signInFailed(db: Db, reservation: Reservation): Promise<{ accountLocked: boolean }> {
  let accountLocked = false
  for (const { key, limit } of reservation.keys) {
    const [locked] = await db.update(signInFailures)
      .set({ lockedUntil: sql`now() + make_interval(mins => ${LOCK_MINUTES})` })
      .where(sql`${signInFailures.key} = ${key} and ${signInFailures.failures} >= ${limit} and ${signInFailures.lockedUntil} is null`)
      .returning({ key: signInFailures.key })
    if (locked && key.startsWith('account:')) accountLocked = true
  }
  return { accountLocked }
}

/** The attempt succeeded: the account starts afresh; the address gives back this attempt only. */
export async function signInSucceeded(db: Db, reservation: Reservation) {
  for (const { key } of reservation.keys) {
    if (key.startsWith('account:')) await db.delete(signInFailures).where(eq(signInFailures.key, key))
    else await releaseAttempt(db, key)
  }
}

/** The attempt never reached the password check (e.g. a missing CSRF token): it does not count. */
export async function signInAbandoned(db: Db, reservation: Reservation) {
  for (const { key } of reservation.keys) await releaseAttempt(db, key)
}

async function releaseAttempt(db: Db, key: string) {
  await db.update(signInFailures).set({ failures: sql`greatest(${signInFailures.failures} - 1, 0)` })
    .where(sql`${signInFailures.key} = ${key} and ${signInFailures.lockedUntil} is null`)
}
