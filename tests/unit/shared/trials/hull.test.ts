import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { convexHull, hullCentre, insideHull } from '../../../../shared/trials/hull'

// Convex hull: the smallest convex polygon holding every point (geometry, common knowledge); worked by hand below.
describe('convexHull (monotone chain, Andrew 1979)', () => {
  it('a square with a point inside gives the four corners, counter-clockwise from the lowest-left (by hand)', () => {
    const hull = convexHull([{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }, { x: 1, y: 1 }])
    expect(hull).toEqual([{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }])
  })
  it('a point on an edge is not a corner; duplicates count once (by hand)', () => {
    expect(convexHull([{ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 2, y: 0 }, { x: 1, y: 3 }, { x: 1, y: 3 }])).toEqual([{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 1, y: 3 }])
  })
  it('collinear points give the two ends; one point gives itself; none gives none (by hand)', () => {
    expect(convexHull([{ x: 1, y: 1 }, { x: 2, y: 2 }, { x: 3, y: 3 }])).toEqual([{ x: 1, y: 1 }, { x: 3, y: 3 }])
    expect(convexHull([{ x: 17.5, y: 250 }])).toEqual([{ x: 17.5, y: 250 }])
    expect(convexHull([])).toEqual([])
  })
  it('volts × in/min: a triangle of three settings keeps all three (by hand)', () => {
    const hull = convexHull([{ x: 17, y: 200 }, { x: 18.5, y: 240 }, { x: 17.5, y: 280 }, { x: 17.6, y: 240 }])
    expect(hull).toHaveLength(3)
    expect(hull).not.toContainEqual({ x: 17.6, y: 240 })
  })
  it('every point lies inside or on its hull, and the hull is convex (property)', () => {
    const point = fc.record({ x: fc.integer({ min: -50, max: 50 }), y: fc.integer({ min: -50, max: 50 }) })
    fc.assert(fc.property(fc.array(point, { minLength: 1, maxLength: 30 }), (points) => {
      const hull = convexHull(points)
      expect(points.every(p => insideHull(hull, p))).toBe(true)
      if (hull.length >= 3) {
        hull.forEach((a, i) => {
          const b = hull[(i + 1) % hull.length]!
          const c = hull[(i + 2) % hull.length]!
          expect((b.x - a.x) * (c.y - a.y) - (b.y - a.y) * (c.x - a.x)).toBeGreaterThan(0)
        })
      }
    }))
  })
  it('a point outside the square is outside the hull (by hand)', () => {
    const hull = convexHull([{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }])
    expect(insideHull(hull, { x: 2.01, y: 1 })).toBe(false)
    expect(insideHull(hull, { x: 2, y: 1 })).toBe(true)
  })
  it('the centroid of a triangle is the mean of its corners (geometry, common knowledge)', () => {
    const c = hullCentre(convexHull([{ x: 0, y: 0 }, { x: 6, y: 0 }, { x: 0, y: 3 }]))!
    expect(c.x).toBeCloseTo(2, 9)
    expect(c.y).toBeCloseTo(1, 9)
  })
})
