import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'

const pr = (input: Record<string, unknown>, unit: 'in' | 'mm' = 'in', edition?: string) =>
  ok({ code: 'asme-ix', check: 'procedure-ranges', unit, ...(edition ? { edition } : {}), input })

describe('ASME IX procedure ranges, Table QW-451.1 (ASME BPVC.IX-2017, read in full)', () => {
  it('a 1 in coupon qualifies 3/16 to 2 in, 4 side bends (eng-tips post-405962)', () => {
    const r = pr({ process: 'GMAW', couponThickness: 1 })
    expect(r.baseMetal).toEqual({ min: 0.1875, max: 2 })
    expect(r.specimens).toEqual({ tension: 2, face: 0, root: 0, side: 4 })
  })

  it('a 1-1/2 in coupon qualifies 3/16 to 8 in for SMAW (eng-tips 336813; Note 3)', () => {
    expect(pr({ process: 'SMAW', couponThickness: 1.5 }).baseMetal).toEqual({ min: 0.1875, max: 8 })
  })

  it('Note 3: the 8 in maximum is for SMAW, SAW, GMAW, PAW, LLBW, GTAW only; FCAW gets 2T', () => {
    expect(pr({ process: 'FCAW', couponThickness: 1.5 }).baseMetal).toEqual({ min: 0.1875, max: 3 })
    expect(pr({ process: 'FCAW', couponThickness: 38 }, 'mm').baseMetal).toEqual({ min: 5, max: 76 })
    expect(pr({ process: 'GTAW', couponThickness: 38 }, 'mm').baseMetal).toEqual({ min: 5, max: 200 })
  })

  it('a 3/16 in coupon qualifies 1/16 to 3/8 in, 2 face + 2 root (eng-tips 336813)', () => {
    const r = pr({ process: 'SMAW', couponThickness: 0.1875 })
    expect(r.baseMetal).toEqual({ min: 0.0625, max: 0.375 })
    expect(r.specimens).toEqual({ tension: 2, face: 2, root: 2, side: 0 })
  })

  it('boundaries as the table reads: 3/8 in is in the 1/16–3/8 inclusive row, just over it is the 3/16 row', () => {
    expect(pr({ process: 'SMAW', couponThickness: 0.375 }).baseMetal).toEqual({ min: 0.0625, max: 0.75 })
    expect(pr({ process: 'SMAW', couponThickness: 0.376 }).baseMetal).toEqual({ min: 0.1875, max: 0.752 })
    expect(pr({ process: 'SMAW', couponThickness: 0.75 }).specimens).toMatchObject({ side: 4, face: 0 })
    expect(pr({ process: 'SMAW', couponThickness: 6 }).baseMetal).toEqual({ min: 0.1875, max: 8 })
  })

  it('SI rows: 1.5 mm, 10 mm and 19 mm boundaries in mm (mechanicalguruji, QW-451.1 mm rows)', () => {
    expect(pr({ process: 'SMAW', couponThickness: 1.4 }, 'mm').baseMetal).toEqual({ min: 1.4, max: 2.8 })
    expect(pr({ process: 'SMAW', couponThickness: 10 }, 'mm').baseMetal).toEqual({ min: 1.5, max: 20 })
    expect(pr({ process: 'SMAW', couponThickness: 12 }, 'mm').baseMetal).toEqual({ min: 5, max: 24 })
  })

  it('over 6 in: 3/16 in to 1.33T, deposit 1.33T when t ≥ 3/4 in (Note 6, 2017 table)', () => {
    const r = pr({ process: 'SMAW', couponThickness: 7 })
    expect(r.baseMetal).toEqual({ min: 0.1875, max: 9.31 })
    expect(r.depositMax).toBe(9.31)
    expect(pr({ process: 'SMAW', couponThickness: 7, depositThickness: 0.5 }).depositMax).toBe(1)
  })

  it('deposit t: 2t when t < 3/4 in, 2T when t ≥ 3/4 in in the 3/4 to 1-1/2 row', () => {
    expect(pr({ process: 'GTAW', couponThickness: 1, depositThickness: 0.25 }).depositMax).toBe(0.5)
    expect(pr({ process: 'GTAW', couponThickness: 1, depositThickness: 0.75 }).depositMax).toBe(2)
  })

  it('QW-403.6 toughness: a 1 in coupon gives a 5/8 in minimum, a 3/16 in coupon 3/32 in (eng-tips)', () => {
    expect(pr({ process: 'SMAW', couponThickness: 1, toughness: true }).baseMetal).toEqual({ min: 0.625, max: 2 })
    expect(pr({ process: 'SMAW', couponThickness: 0.1875, toughness: true }).baseMetal).toEqual({ min: 0.09375, max: 0.375 })
  })

  it('QW-403.10 GMAW-S 1.1T below 1/2 in applies to the 2019 edition, not to 2021 and later (mewelding 2021 changes)', () => {
    const old = pr({ process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.25 }, 'in', '2019')
    expect(old.baseMetal).toEqual({ min: 0.0625, max: 0.275 })
    expect(old.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-403.10' }))
    const current = pr({ process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.25 }, 'in', '2021')
    expect(current.baseMetal).toEqual({ min: 0.0625, max: 0.5 })
    expect(current.reasons).not.toContainEqual(expect.objectContaining({ clause: 'QW-403.10' }))
    expect(pr({ process: 'GMAW', transfer: 'spray', couponThickness: 0.25 }, 'in', '2019').baseMetal).toEqual({ min: 0.0625, max: 0.5 })
  })

  it('QW-403.9: a pass over 1/2 in limits the maximum to 1.1T (AWS forum, [V-partial])', () => {
    expect(pr({ process: 'SAW', couponThickness: 1, maxPassThickness: 0.625 }).baseMetal).toEqual({ min: 0.1875, max: 1.1 })
    expect(pr({ process: 'GTAW', couponThickness: 1, maxPassThickness: 0.625 }).baseMetal).toEqual({ min: 0.1875, max: 2 })
  })

  it('Note (5) side bends in lieu of face and root from 3/8 in: from memory, so marked memory', () => {
    const r = pr({ process: 'SMAW', couponThickness: 0.5 })
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-451.1 Note (5)', basis: 'memory' }))
  })

  it('names the edition and a caution in every result', () => {
    const r = pr({ process: 'SMAW', couponThickness: 1 })
    expect(r.edition).toBe('2023')
    expect(r.caution).toContain('Authorized Inspector')
    // every reason names a clause of QW-451.1 and a basis of the ones the product prints
    expect(r.reasons.length).toBeGreaterThan(0)
    for (const reason of r.reasons as { clause: string, text: string, basis: string }[]) {
      expect(reason.clause).toMatch(/^QW-/)
      expect(reason.text.length).toBeGreaterThan(10)
      expect(['verified', 'partial', 'memory', 'convention']).toContain(reason.basis)
    }
    expect(r.reasons).toContainEqual(expect.objectContaining({ clause: 'QW-451.1', basis: 'verified' }))
  })

  it('refuses a deposit thicker than the coupon and unknown processes', () => {
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: 0.5, depositThickness: 0.6 } })).toContain('depositThickness')
    expect(refused({ code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'MIG', couponThickness: 0.5 } })).toContain('not an ASME IX process')
  })

  it('outside Note 3 the table itself is not monotonic at 6 in: FCAW 6 in gives 2T = 12 in, 7 in gives 1.33T (QW-451.1 Notes 1, 3, 6)', () => {
    expect(pr({ process: 'FCAW', couponThickness: 6 }).baseMetal).toEqual({ min: 0.1875, max: 12 })
    expect(pr({ process: 'FCAW', couponThickness: 7 }).baseMetal).toEqual({ min: 0.1875, max: 9.31 })
  })

  it('property: a thicker coupon never qualifies a smaller maximum (QW-451.1, Note 3 processes, both editions)', () => {
    const processes = fc.constantFrom('SMAW', 'GTAW', 'GMAW', 'SAW', 'PAW')
    const thickness = fc.integer({ min: 1, max: 12 * 64 }).map(n => n / 64)
    fc.assert(fc.property(processes, thickness, thickness, fc.constantFrom('2019', '2023'), fc.boolean(), (process, a, b, edition, short) => {
      const [thin, thick] = a <= b ? [a, b] : [b, a]
      const input = (T: number) => ({ process, couponThickness: T, ...(short && process === 'GMAW' ? { transfer: 'short-circuit' } : {}) })
      const max = (T: number) => (pr(input(T), 'in', edition).baseMetal as { max: number }).max
      expect(max(thick)).toBeGreaterThanOrEqual(max(thin))
    }), { numRuns: 300 })
  })
})
