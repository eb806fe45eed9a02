import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// What an inspector reads after judging bends and films. Limits: QW-163, 1/8 in on the convex surface, corner
// discontinuities counted only from an internal discontinuity (docs/sources.md §A5.163); QW-191.1.2.2 radiography:
// (b)(1) cracks and incomplete fusion or penetration reject, (b)(2) slag 1/8 in up to t = 3/8 in, t/3 up to 2-1/4 in,
// 3/4 in over it, (b)(3) slag in line, (b)(4) rounded indications 20% of t or 1/8 in, whichever is smaller, under
// 1/32 in not counted, and the charts (§A5.191). Metric: 3 mm and 10 mm, as the code prints them. Sentences: Rootface's.
const rt = (thickness: number, indications: unknown[], unit: 'in' | 'mm' = 'in') => ok({ code: 'asme-ix', check: 'radiography', unit, input: { thickness, indications } })
const pick = (r: Record<string, unknown>) => ({ accepted: r.accepted, reason: r.reason, chartCheckRequired: r.chartCheckRequired, reasons: r.reasons })

describe('QW-191.1.2.2 radiography answers', () => {
  it('t = 3/4 in, two slag lines within t/3 and a counted rounded indication: accepted, with the checks left to the film', () => {
    expect(pick(rt(0.75, [{ kind: 'slag', length: 0.2 }, { kind: 'slag', length: 0.25 }, { kind: 'rounded', length: 0.1 }, { kind: 'rounded', length: 0.02 }]))).toEqual({
      accepted: true, chartCheckRequired: true,
      reason: 'No indication exceeds the QW-191.1.2.2 limits; confirm the rounded indications on the charts.',
      reasons: [
        { clause: 'QW-191.1.2.2(b)(2)', text: 'Elongated slag up to t/3 = 1/4 in for t = 3/4 in: every inclusion is within it.', basis: 'verified' },
        { clause: 'QW-191.1.2.2(b)(3)', text: 'Slag inclusions in line must not total more than t in a length of 12t unless the gaps exceed 6L: judge their spacing on the film.', basis: 'verified' },
        { clause: 'Figure QW-191.1.2.2(b)(4)', text: 'Rounded indications on t of 1/8 in and over must also be judged against the charts: not computed here.', basis: 'verified' },
        { clause: 'QW-191.1.2.2(b)(4)', text: 'Rounded indications up to 1/8 in; under 1/32 in not counted.', basis: 'verified' },
      ],
    })
  })
  it('a clean film on t = 3/8 in: accepted with no chart check; one slag line needs no in-line judgement', () => {
    expect(pick(rt(0.375, []))).toEqual({
      accepted: true, chartCheckRequired: false, reason: 'No indication exceeds the QW-191.1.2.2 limits.',
      reasons: [
        { clause: 'QW-191.1.2.2(b)(2)', text: 'Elongated slag up to 1/8 in for t = 3/8 in: none recorded.', basis: 'verified' },
        { clause: 'QW-191.1.2.2(b)(4)', text: 'Rounded indications up to 0.075 in; under 1/32 in not counted.', basis: 'verified' }, // 20% of 3/8 in
      ],
    })
    expect((rt(0.375, [{ kind: 'slag', length: 0.1 }]).reasons as { clause: string }[]).map(r => r.clause)).not.toContain('QW-191.1.2.2(b)(3)')
  })
  it('rejections name the indication and the limit', () => {
    expect(rt(0.75, [{ kind: 'incomplete-fusion', length: 0.01 }]).reason).toBe('An incomplete fusion indication rejects the weld.')
    expect(rt(0.75, [{ kind: 'crack', length: 0.01 }]).reason).toBe('A crack indication rejects the weld.')
    expect(rt(3, [{ kind: 'slag', length: 0.76 }]).reason).toBe('An elongated slag inclusion of 0.76 in is longer than 3/4 in for t = 3 in.')
    expect(rt(10, [{ kind: 'slag', length: 3.5 }], 'mm').reason).toBe('An elongated slag inclusion of 3.5 mm is longer than 3 mm for t = 10 mm.')
    expect(rt(0.5, [{ kind: 'rounded', length: 0.126 }]).reason).toBe('A rounded indication of 0.126 in is larger than 0.1 in (20% of t or 1/8 in, whichever is smaller).')
  })
  it('t just over 3/8 in already uses t/3; just over 2-1/4 in uses 3/4 in', () => {
    expect(rt(0.376, [{ kind: 'slag', length: 0.125 }]).accepted).toBe(true) // t/3 = 0.1253 in
    expect(rt(0.376, [{ kind: 'slag', length: 0.1254 }]).accepted).toBe(false)
    expect(rt(2.25, [{ kind: 'slag', length: 0.75 }]).accepted).toBe(true) // t/3 = 3/4 in at 2-1/4 in
    expect(rt(2.26, [{ kind: 'slag', length: 0.751 }]).accepted).toBe(false) // over 2-1/4 in: 3/4 in
  })
  it('rounded: exactly 1/32 in is counted, just under is not', () => {
    expect(rt(0.1, [{ kind: 'rounded', length: 0.03125 }]).accepted).toBe(false) // counted, and over 20% of 0.1 in
    expect(rt(0.1, [{ kind: 'rounded', length: 0.0312 }]).accepted).toBe(true)
    expect(rt(0.5, [{ kind: 'rounded', length: 0.1 }]).accepted).toBe(true) // exactly 20% of 1/2 in
  })
})

describe('QW-163 bend answers, specimen by specimen', () => {
  it('counts corner indications only with an internal cause and says how many it left out', () => {
    const r = ok({ code: 'asme-ix', check: 'bend', unit: 'in', input: { specimens: [
      { type: 'face', indications: [{ size: 0.1 }, { size: 0.3, atCorner: true }, { size: 0.2, atCorner: true }] },
      { type: 'root', indications: [] },
      { type: 'side', indications: [{ size: 0.2 }, { size: 0.2, atCorner: true }] },
    ] } })
    expect(r.accepted).toBe(false)
    expect(r.specimens).toEqual([
      { accepted: true, reason: 'face bend: largest open discontinuity 0.1 in, not over 1/8 in. 2 corner indications with no sign of an internal discontinuity not counted.' },
      { accepted: true, reason: 'root bend: no counted open discontinuity.' },
      { accepted: false, reason: 'side bend: an open discontinuity of 0.2 in exceeds 1/8 in. 1 corner indication with no sign of an internal discontinuity not counted.' },
    ])
    expect(r.reasons).toEqual([
      { clause: 'QW-163', text: 'No open discontinuity over 1/8 in in any direction on the convex surface; corner discontinuities count only when they come from lack of fusion, slag or another internal discontinuity.', basis: 'verified' },
      { clause: 'QW-163', text: 'The weld and heat-affected zone must lie wholly within the bent portion: confirm on the specimens.', basis: 'verified' },
    ])
  })
  it('in SI the limit prints as 3 mm', () => {
    const r = ok({ code: 'asme-ix', check: 'bend', unit: 'mm', input: { specimens: [{ type: 'root', indications: [{ size: 2 }] }] } })
    expect(r.specimens).toEqual([{ accepted: true, reason: 'root bend: largest open discontinuity 2 mm, not over 3 mm.' }])
    expect(r.accepted).toBe(true)
  })
})
