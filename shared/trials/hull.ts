/** A point of a plane of two settings (volts × wire feed speed, volts × CTWD). */
export interface PlanePoint {
  x: number
  y: number
}

const cross = (o: PlanePoint, a: PlanePoint, b: PlanePoint) => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x)

/**
 * The convex hull of the points, counter-clockwise from the lowest-left point, without repeated or collinear points
 * (A. M. Andrew, "Another efficient algorithm for convex hulls in two dimensions", Information Processing Letters 9(5),
 * 1979: the monotone chain). One point gives that point; points on a line give the two ends of the segment.
 * A hull is unchanged by scaling either axis, so volts and inches per minute need no common scale.
 */
export function convexHull(points: readonly PlanePoint[]): PlanePoint[] {
  const sorted = [...points].filter(p => Number.isFinite(p.x) && Number.isFinite(p.y))
    .sort((a, b) => a.x - b.x || a.y - b.y)
  const unique = sorted.filter((p, i) => i === 0 || p.x !== sorted[i - 1]!.x || p.y !== sorted[i - 1]!.y)
  if (unique.length <= 2) return unique.map(p => ({ x: p.x, y: p.y }))
  const lower: PlanePoint[] = []
  for (const p of unique) {
    while (lower.length >= 2 && cross(lower[lower.length - 2]!, lower[lower.length - 1]!, p) <= 0) lower.pop()
    lower.push(p)
  }
  const upper: PlanePoint[] = []
  for (const p of [...unique].reverse()) {
    while (upper.length >= 2 && cross(upper[upper.length - 2]!, upper[upper.length - 1]!, p) <= 0) upper.pop()
    upper.push(p)
  }
  const hull = [...lower.slice(0, -1), ...upper.slice(0, -1)].map(p => ({ x: p.x, y: p.y }))
  // All points on one line: the monotone chain leaves the two ends.
  return hull
}

/** Whether a point lies inside or on the edge of a convex hull (counter-clockwise, as convexHull gives it). */
export function insideHull(hull: readonly PlanePoint[], p: PlanePoint, tolerance = 1e-9): boolean {
  if (hull.length === 0) return false
  if (hull.length === 1) return Math.abs(hull[0]!.x - p.x) <= tolerance && Math.abs(hull[0]!.y - p.y) <= tolerance
  if (hull.length === 2) {
    const [a, b] = hull as [PlanePoint, PlanePoint]
    const onLine = Math.abs(cross(a, b, p)) <= tolerance * Math.max(1, Math.hypot(b.x - a.x, b.y - a.y))
    return onLine && p.x >= Math.min(a.x, b.x) - tolerance && p.x <= Math.max(a.x, b.x) + tolerance
      && p.y >= Math.min(a.y, b.y) - tolerance && p.y <= Math.max(a.y, b.y) + tolerance
  }
  return hull.every((a, i) => cross(a, hull[(i + 1) % hull.length]!, p) >= -tolerance)
}

/** The centroid of the hull's area (a point or segment: the mean of its points); null for no points. */
export function hullCentre(hull: readonly PlanePoint[]): PlanePoint | null {
  if (hull.length === 0) return null
  if (hull.length < 3) return { x: hull.reduce((s, p) => s + p.x, 0) / hull.length, y: hull.reduce((s, p) => s + p.y, 0) / hull.length }
  let area = 0
  let cx = 0
  let cy = 0
  hull.forEach((a, i) => {
    const b = hull[(i + 1) % hull.length]!
    const f = a.x * b.y - b.x * a.y
    area += f
    cx += (a.x + b.x) * f
    cy += (a.y + b.y) * f
  })
  return { x: cx / (3 * area), y: cy / (3 * area) }
}
