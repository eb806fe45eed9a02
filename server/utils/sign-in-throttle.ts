// Repeated failed sign-ins for one account or one address are slowed down, not refused:
// after FREE_FAILURES the next attempt waits 1 s, then 2 s, 4 s... up to MAX_DELAY_MS.
const FREE_FAILURES = 3
const MAX_DELAY_MS = 8000
const WINDOW_MS = 15 * 60 * 1000

const failures = new Map<string, { count: number, last: number }>()

function keyCount(key: string, now: number) {
  const entry = failures.get(key)
  if (!entry || now - entry.last > WINDOW_MS) return 0
  return entry.count
}

export function signInDelayMs(keys: string[], now = Date.now()) {
  const count = Math.max(0, ...keys.map(key => keyCount(key, now)))
  if (count < FREE_FAILURES) return 0
  return Math.min(MAX_DELAY_MS, 1000 * 2 ** (count - FREE_FAILURES))
}

export function recordSignInFailure(keys: string[], now = Date.now()) {
  for (const key of keys) failures.set(key, { count: keyCount(key, now) + 1, last: now })
}

export function clearSignInFailures(keys: string[]) {
  for (const key of keys) failures.delete(key)
}
