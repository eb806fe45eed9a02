import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// The whole answer of three ASME IX welder tests, reasons included: what a welder's card shows. Each value is the
// published one: deposit 2t, QW-452.1(b) (docs/sources.md §A2b); bend specimens, QW-452.1(a) and its note on face and
// root in place of side bends (§A2a); diameter bands, QW-452.3 and QW-452.4 (§A2.3); positions, Table QW-461.9 with its
// † footnote (§A3); F-Nos., QW-433 (from memory, §A6); P-Nos., QW-423.1 (§A6). The sentences are Rootface's own.
const wr = (input: Record<string, unknown>) => ok({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', edition: '2023', input })

describe('ASME IX welder test answers, reason by reason', () => {
  it('SMAW plate 3G, 3/8 in, F-No. 4 with backing, P-No. 1', () => {
    const r = wr({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 0.375, fNumber: 4, backing: true, pNumber: '1' })
    expect(r).toMatchObject({
      positions: { groove: ['F', 'V'], groovePipe: ['F'], groovePipeMinDiameter: 2.875, fillet: ['F', 'H', 'V'] }, // QW-461.9 3G row, † 2-7/8 in
      depositMax: 0.75, // 2t, QW-452.1(b)
      bendSpecimens: { face: 0, root: 0, side: 2, total: 2 }, // 3/8 in and over: 2 side, QW-452.1(a)
      diameter: { min: 2.875, max: null }, // plate test: pipe 2-7/8 in OD and over, QW-461.9 †
      fNumbers: { numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: false }, // F-No. 4 with backing, QW-433 (from memory)
      pNumbers: ['P-No. 1 through P-No. 15F, P-No. 34, P-No. 41 through P-No. 49'], // QW-423.1
    })
    expect(r.undetermined).toBeUndefined()
    expect(r.reasons).toEqual([
      { clause: 'QW-452.1(b) Note 1', text: 'No deposit thickness given: t is taken as the coupon thickness (one welder, one process).', basis: 'convention' },
      { clause: 'QW-452.1(b)', text: 'Deposit of 3/8 in: up to 2t = 3/4 in.', basis: 'verified' },
      { clause: 'QW-452.1(a)', text: 'Weld metal of 3/8 in: 2 side bends (face and root bends in equal numbers may replace them).', basis: 'verified' },
      { clause: 'QW-461.9 †', text: 'A plate groove test qualifies groove welds on pipe of 24 in OD or less only in F, and only on pipe of 2-7/8 in OD and over.', basis: 'verified' },
      { clause: 'QW-461.9', text: 'Groove welds on plate and on pipe over 24 in OD: F, V; on pipe of 24 in OD or less: F.', basis: 'verified' },
      { clause: 'QW-452.6, QW-303.1', text: 'The groove test also qualifies fillet welds of all sizes on all base metal thicknesses and all diameters, in F, H, V.', basis: 'verified' },
      { clause: 'QW-433, QW-402.4', text: 'F-No. 4 with backing qualifies F-No. 1, 2, 3, 4 with backing only.', basis: 'memory' },
      { clause: 'QW-423.1', text: 'P-No. 1 (2023 edition) qualifies P-No. 1 through P-No. 15F, P-No. 34, P-No. 41 through P-No. 49.', basis: 'verified' },
    ])
  })

  it('GTAW pipe 6G, 0.28 in wall, 2-3/8 in OD, F-No. 6 without backing', () => {
    const r = wr({ process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.28, outsideDiameter: 2.375, fNumber: 6, backing: false })
    expect(r).toMatchObject({
      positions: { groove: ['F', 'H', 'V', 'O'], groovePipe: ['F', 'H', 'V', 'O'], fillet: ['F', 'H', 'V', 'O'] }, // QW-461.9 6G row
      depositMax: 0.56, // 2t, QW-452.1(b)
      bendSpecimens: { face: 2, root: 2, side: 0, total: 4 }, // 6G: 4 specimens, under 3/8 in face and root, QW-452.1(a)
      diameter: { min: 1, max: null }, // 1 in to 2-7/8 in band: 1 in OD and over, QW-452.3
      fNumbers: { numbers: [6], withBacking: true, withoutBacking: true }, // F-No. 6, QW-433 (from memory)
    })
    expect(r.pNumbers).toBeUndefined()
    expect(r.positions).not.toHaveProperty('groovePipeMinDiameter') // a pipe test has no † limit
    expect(r.reasons).toEqual([
      { clause: 'QW-452.1(b) Note 1', text: 'No deposit thickness given: t is taken as the coupon thickness (one welder, one process).', basis: 'convention' },
      { clause: 'QW-452.1(b)', text: 'Deposit of 0.28 in: up to 2t = 0.56 in.', basis: 'verified' },
      { clause: 'QW-452.1(a)', text: 'Weld metal under 3/8 in: 2 face and 2 root bends.', basis: 'verified' },
      { clause: 'QW-452.1(a)', text: 'Pipe welded in 5G or 6G: 4 bend specimens in all.', basis: 'verified' },
      { clause: 'QW-452.3', text: 'OD 2-3/8 in is in the 1 in to 2-7/8 in band: 1 in OD and over, for groove welds.', basis: 'verified' },
      { clause: 'QW-461.9', text: 'Groove welds on plate and on pipe over 24 in OD: all positions (F, H, V, O); on pipe of 24 in OD or less: all positions (F, H, V, O).', basis: 'verified' },
      { clause: 'QW-452.6, QW-303.1', text: 'The groove test also qualifies fillet welds of all sizes on all base metal thicknesses and all diameters, in all positions (F, H, V, O).', basis: 'verified' },
      { clause: 'QW-433, QW-402.4', text: 'F-No. 6 without backing qualifies F-No. 6 with and without backing.', basis: 'memory' },
    ])
  })

  it('a deposit thickness given is used as t, with no Note 1 assumption; 2G + 5G on one coupon: 6 bends', () => {
    const r = wr({ process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['2G', '5G'], couponThickness: 0.5, depositThickness: 0.25, outsideDiameter: 6.625 })
    expect(r.depositMax).toBe(0.5) // 2 × 1/4 in, QW-452.1(b)
    expect(r.bendSpecimens).toEqual({ face: 3, root: 3, side: 0, total: 6 }) // t = 1/4 in < 3/8 in: face and root (even split: from memory)
    expect((r.reasons as { clause: string }[]).map(x => x.clause)).not.toContain('QW-452.1(b) Note 1')
    expect(r.reasons).toContainEqual({ clause: 'QW-452.1(a)', text: '2G and 5G on one coupon: 6 bend specimens in all.', basis: 'verified' })
    expect(r.diameter).toEqual({ min: 2.875, max: null }) // over 2-7/8 in OD: 2-7/8 in and over, QW-452.3
  })

  it('a fillet pipe test without OD or coupon thickness: positions only, and what to record', () => {
    const r = wr({ process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: ['5F'] })
    expect(r.positions).toEqual({ groove: [], fillet: ['F', 'H', 'V', 'O'] }) // QW-461.9 5F row
    expect(r.undetermined).toEqual([
      { field: 'outsideDiameter', needed: 'QW-452.4: the test pipe OD gives the diameters qualified' },
      { field: 'couponThickness', needed: 'QW-452.5: the fillet test coupon thickness gives the thicknesses and fillet sizes qualified' },
    ])
    expect(r.reasons).toEqual([{ clause: 'QW-461.9', text: 'Fillet welds: all positions (F, H, V, O). A fillet test qualifies no groove welds.', basis: 'memory' }])
    for (const key of ['thickness', 'diameter', 'depositMax', 'bendSpecimens', 'fNumbers']) expect(r).not.toHaveProperty(key)
  })
  it('a combination coupon (QW-306, from memory): each process its own deposit, and the combined deposit', () => {
    const combo = (processes: unknown[]) => wr({ form: 'pipe', weld: 'groove', testPositions: ['6G'], outsideDiameter: 6.625, couponThickness: 0.75, processes })
    const unlimited = combo([{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW', depositThickness: 0.5, layers: 4 }])
    expect(unlimited.deposits).toEqual([{ process: 'GTAW', depositMax: 0.25, clause: 'QW-452.1(b)' }, { process: 'SMAW', depositMax: null, clause: 'QW-452.1(b)' }]) // 2t; 1/2 in in 3+ layers: maximum
    expect(unlimited.combinedDepositMax).toBeNull()
    expect(unlimited.bendSpecimens).toEqual({ face: 0, root: 0, side: 4, total: 4 }) // 5/8 in of weld metal, 6G: 4 side (QW-452.1(a))
    expect((unlimited.reasons as { clause: string, text: string }[]).slice(0, 3).map(x => x.text)).toEqual([
      'GTAW: Deposit of 1/8 in: up to 2t = 1/4 in.',
      'SMAW: Deposit of 1/2 in (1/2 in or more) in 4 layers: the maximum to be welded.',
      'The combination: each process within its own deposit (GTAW 1/4 in, SMAW maximum to be welded); the combined deposit up to the maximum to be welded.',
    ])
    const limited = combo([{ process: 'GTAW', depositThickness: 0.125, fNumber: 6 }, { process: 'GMAW', transfer: 'short-circuit', depositThickness: 0.25 }])
    expect(limited.deposits).toEqual([{ process: 'GTAW', depositMax: 0.25, clause: 'QW-452.1(b)' }, { process: 'GMAW', transfer: 'short-circuit', depositMax: 0.275, clause: 'QW-404.32' }]) // 1.1t
    expect(limited.combinedDepositMax).toBe(0.525) // 1/4 + 0.275 in
    expect(limited.reasons).toContainEqual({ clause: 'QW-306', text: 'The combination: each process within its own deposit (GTAW 1/4 in, GMAW 0.275 in); the combined deposit up to 0.525 in.', basis: 'memory' })
    expect(limited.reasons).toContainEqual({ clause: 'QW-433, QW-402.4', text: 'F-No. 6 (GTAW) (backing not recorded) qualifies F-No. 6 with backing only.', basis: 'memory' })
    expect(limited.undetermined).toEqual([{ field: 'backing', needed: 'QW-433, QW-402.4: whether the test had backing says whether the F-Nos. are qualified without backing (given here with backing only)' }])
    const open = combo([{ process: 'GTAW', depositThickness: 0.125 }, { process: 'SMAW' }])
    expect(open.deposits).toEqual([{ process: 'GTAW', depositMax: 0.25, clause: 'QW-452.1(b)' }, { process: 'SMAW', clause: 'QW-452.1(b) Note 1' }])
    expect(open).not.toHaveProperty('combinedDepositMax')
    expect(open.undetermined).toEqual([{ field: 'processes[1].depositThickness', needed: 'QW-452.1(b) Note 1: the SMAW deposit gives the deposit that process qualifies' }])
    expect(open.bendSpecimens).toEqual({ face: 0, root: 0, side: 4, total: 4 }) // the coupon's 3/4 in stands in for the unknown sum
  })
})
