import type { PqrRecord } from './inputs'

// What the WPS support checks of every code share: the ranges several PQRs qualify joined into one, and a PQR's name.

export type Interval = [number, number]

/** Join intervals that overlap or touch (the ranges of several supporting PQRs, QW-200.4 and its counterparts). */
export function union(intervals: Interval[]): Interval[] {
  const sorted = [...intervals].sort((a, b) => a[0] - b[0])
  const joined: Interval[] = []
  for (const [low, high] of sorted) {
    const last = joined[joined.length - 1]
    if (last && low <= last[1]) last[1] = Math.max(last[1], high)
    else joined.push([low, high])
  }
  return joined
}

/** The PQR's own number, or its place in the list when it has none. */
export const pqrLabel = (pqr: PqrRecord, i: number) => pqr.id ?? `PQR ${i + 1}`
