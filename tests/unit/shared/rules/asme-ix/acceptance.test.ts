import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

const bend = (indications: unknown[], unit: 'in' | 'mm' = 'in') =>
  ok({ code: 'asme-ix', check: 'bend', unit, input: { specimens: [{ type: 'face', indications }] } })
const rt = (thickness: number, indications: unknown[], unit: 'in' | 'mm' = 'in', extra: Record<string, unknown> = {}) =>
  ok({ code: 'asme-ix', check: 'radiography', unit, input: { thickness, indications, ...extra } })

describe('ASME IX QW-163 guided bends (proxied scribd copy of the code text)', () => {
  it('exactly 1/8 in passes; over 1/8 in fails', () => {
    expect(bend([{ size: 0.125 }]).accepted).toBe(true)
    expect(bend([{ size: 0.126 }]).accepted).toBe(false)
  })
  it('unit edge case: 3.1 mm passes in inches (0.122 in < 1/8 in) and fails in SI (3 mm); 3.2 mm fails in both', () => {
    expect(bend([{ size: 3.1 }], 'mm').accepted).toBe(false)
    expect(bend([{ size: 3.1 / 25.4 }], 'in').accepted).toBe(true)
    expect(bend([{ size: 3.2 }], 'mm').accepted).toBe(false)
    expect(bend([{ size: 3.2 / 25.4 }], 'in').accepted).toBe(false)
    expect(bend([{ size: 3 }], 'mm').accepted).toBe(true)
  })
  it('corner discontinuities are not counted unless they come from an internal discontinuity', () => {
    expect(bend([{ size: 0.2, atCorner: true }]).accepted).toBe(true)
    expect(bend([{ size: 0.2, atCorner: true, fromInternalDefect: true }]).accepted).toBe(false)
  })
  it('every specimen must pass', () => {
    const r = ok({ code: 'asme-ix', check: 'bend', unit: 'in', input: { specimens: [{ type: 'face', indications: [] }, { type: 'root', indications: [{ size: 0.25 }] }] } })
    expect(r.accepted).toBe(false)
    expect(r.specimens).toEqual([expect.objectContaining({ accepted: true }), expect.objectContaining({ accepted: false })])
  })
})

describe('ASME IX QW-191.1.2.2 radiography of welder tests (ilovetranslation copy)', () => {
  it('any crack, incomplete fusion or incomplete penetration rejects', () => {
    expect(rt(0.5, [{ kind: 'crack', length: 0.01 }]).accepted).toBe(false)
    expect(rt(0.5, [{ kind: 'incomplete-penetration', length: 0.01 }]).accepted).toBe(false)
  })
  it('slag: 1/8 in up to t = 3/8 in; t/3 up to 2-1/4 in; 3/4 in above', () => {
    expect(rt(0.375, [{ kind: 'slag', length: 0.125 }]).accepted).toBe(true)
    expect(rt(0.375, [{ kind: 'slag', length: 0.13 }]).accepted).toBe(false)
    expect(rt(0.75, [{ kind: 'slag', length: 0.25 }]).accepted).toBe(true)
    expect(rt(0.75, [{ kind: 'slag', length: 0.26 }]).accepted).toBe(false)
    expect(rt(3, [{ kind: 'slag', length: 0.75 }]).accepted).toBe(true)
    expect(rt(3, [{ kind: 'slag', length: 0.76 }]).accepted).toBe(false)
    expect(rt(57, [{ kind: 'slag', length: 19 }], 'mm').accepted).toBe(true)
  })
  it('rounded: largest 20% of t or 1/8 in, whichever is smaller; under 1/32 in not counted', () => {
    expect(rt(0.5, [{ kind: 'rounded', length: 0.1 }]).accepted).toBe(true)
    expect(rt(0.5, [{ kind: 'rounded', length: 0.126 }]).accepted).toBe(false)
    expect(rt(0.25, [{ kind: 'rounded', length: 0.06 }]).accepted).toBe(false)
    expect(rt(0.5, [{ kind: 'rounded', length: 0.1 }]).chartCheckRequired).toBe(true)
  })
  it('t under 1/8 in: a counted indication (1/32 in and over) is already over 20% of t; smaller ones are not counted', () => {
    expect(rt(0.1, [{ kind: 'rounded', length: 0.03125 }]).accepted).toBe(false)
    expect(rt(0.1, [{ kind: 'rounded', length: 0.02 }, { kind: 'rounded', length: 0.03 }]).accepted).toBe(true)
    expect(rt(2.5, [{ kind: 'rounded', length: 0.7 }], 'mm').accepted).toBe(true)
  })
  it('QW-304: a GMAW-S welder cannot be qualified by radiography (underfill blog)', () => {
    const r = rt(0.375, [], 'in', { process: 'GMAW', transfer: 'short-circuit' })
    expect(r.accepted).toBe(false)
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-304' }))
  })
})
