import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// Whole AWS D1.1 welder answers, reason by reason. Plate thickness and bends: docs/sources.md §B1 (Table 4.11 in 2015,
// 6.11 from 2020); pipe: §B2 (Tables 10.12 and 10.13, 2020: over 4 in with a wall of 3/8 in or less, wall 1/8 to 3/4 in,
// 5G/6G 2 face + 2 root; the minimum size, footnote f, not legible so not carried); positions and the 24 in pipe
// limit of a plate test: §B4 (Table 6.10); essential variables and electrode groups: from memory. Sentences: Rootface's.
const d11 = (check: string, input: unknown, edition = '2020') => ok({ code: 'aws-d1.1', check, unit: 'in', edition, input })
const plate = (testPositions: string[], couponThickness: number, extra: Record<string, unknown> = {}) =>
  ({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions, couponThickness, ...extra })

describe('AWS D1.1 welder ranges, reason by reason', () => {
  it('2020, plate 3G + 4G, 1 in: all positions, 1/8 in to unlimited, 2 side bends, pipe only from 24 in', () => {
    const r = d11('welder-ranges', plate(['3G', '4G'], 1))
    expect(r).toMatchObject({
      positions: { groove: ['F', 'H', 'V', 'O'], groovePipe: ['F', 'H', 'V', 'O'], groovePipeMinDiameter: 24, fillet: ['F', 'H', 'V', 'O'] },
      thickness: { min: 0.125, max: null },
      bendSpecimens: { face: 0, root: 0, side: 2, total: 2 },
    })
    expect(r.reasons).toEqual([
      { clause: 'Table 6.10', text: 'Groove (CJP and PJP): all positions; fillet: all positions. A CJP groove test also qualifies PJP and fillet welds.', basis: 'verified' },
      { clause: 'Table 6.11', text: 'A plate of 1 in or more qualifies 1/8 in to unlimited.', basis: 'verified' },
      { clause: 'Table 6.11', text: 'Bends: 2 side.', basis: 'memory' },
      { clause: 'Table 6.10 note b', text: 'A plate test qualifies CJP groove welds on pipe only of 24 in diameter and over, with backing, backgouging or both.', basis: 'verified' },
    ])
  })
  it('2015, plate 2G, 3/8 in: the 2015 table numbers, 1/8 to 3/4 in, 1 face + 1 root', () => {
    const r = d11('welder-ranges', plate(['2G'], 0.375), '2015')
    expect(r).toMatchObject({ positions: { groove: ['F', 'H'], fillet: ['F', 'H'] }, thickness: { min: 0.125, max: 0.75 }, bendSpecimens: { face: 1, root: 1, side: 0, total: 2 } })
    expect(r.reasons).toEqual([
      { clause: 'Table 4.10', text: 'Groove (CJP and PJP): F, H; fillet: F, H. A CJP groove test also qualifies PJP and fillet welds.', basis: 'verified' },
      { clause: 'Table 4.11', text: 'A 3/8 in test plate qualifies 1/8 in to 3/4 in.', basis: 'verified' },
      { clause: 'Table 4.11', text: 'Bends: 1 face and 1 root (2 side bends may replace them).', basis: 'memory' },
      { clause: 'Table 4.10 note b', text: 'A plate test qualifies CJP groove welds on pipe only of 24 in diameter and over, with backing, backgouging or both.', basis: 'verified' },
    ])
  })
  it('2020, pipe 6G, 6-5/8 in OD, 0.28 in wall: wall 1/8 to 3/4 in, 2 face + 2 root, size from the test pipe up (note f not carried)', () => {
    const r = d11('welder-ranges', { process: 'GMAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.28, outsideDiameter: 6.625 })
    expect(r).toMatchObject({ thickness: { min: 0.125, max: 0.75 }, bendSpecimens: { face: 2, root: 2, side: 0, total: 4 } })
    // Table 10.13: a test pipe over 4 in qualifies up to unlimited size; the smallest size of note f is not carried, so the
    // qualified range starts at the test size (never wider than the code) and says so.
    expect(r.diameter).toEqual({ min: 6.625, max: null })
    expect((r.reasons as { clause: string, text: string }[]).slice(1)).toEqual([
      { clause: 'Table 10.13 note f', text: 'Test pipe over 4 in: sizes up to unlimited (read). The smallest size of note f is not carried: Rootface qualifies from the test size, 6-5/8 in, up; check note f by hand for smaller pipe.', basis: 'partial' },
      { clause: 'Table 10.13', text: 'Wall qualified: 1/8 in to 3/4 in.', basis: 'verified' },
      { clause: 'Table 10.13', text: 'Bends (5G/6G/6GR): 2 face and 2 root.', basis: 'verified' },
    ])
  })
  it('a fillet test on plate: positions, and fillet welds on 1/8 in and over (Table 6.11, from memory)', () => {
    const r = d11('welder-ranges', { process: 'FCAW', form: 'plate', weld: 'fillet', testPositions: ['3F'], couponThickness: 0.375 })
    expect(r.positions).toEqual({ groove: [], fillet: ['F', 'H', 'V'] }) // 3F: F, H, V (§B4)
    expect(r.reasons).toEqual([
      { clause: 'Table 6.10', text: 'Fillet: F, H, V. A fillet test qualifies no groove welds.', basis: 'verified' },
      { clause: 'Table 6.11', text: 'A fillet weld test on plate qualifies fillet welds on base metal of 1/8 in to unlimited.', basis: 'memory' },
    ])
    expect(r.thickness).toEqual({ min: 0.125, max: null }) // from memory: Table 6.11, fillet test on plate
  })
})

describe('AWS D1.1 coverage, variable by variable', () => {
  it('a 3G, 3/8 in, F3-with-backing uphill test against an ASME IX joint, F4, without backing, downhill, 0.8 in', () => {
    const r = d11('covers', {
      test: plate(['3G'], 0.375, { fNumber: 3, backing: true, progression: 'uphill' }),
      production: { process: 'SMAW', form: 'plate', weld: 'groove', position: 'V', thickness: 0.8, fNumber: 4, backing: false, progression: 'downhill', code: 'asme-ix' },
    })
    expect([r.covered, r.answer, r.record]).toEqual([false, 'not-covered', []])
    const essentials = 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)'
    expect((r.reasons as { variable: string, state: string, clause: string, text: string }[]).map(x => [x.variable, x.state, x.clause, x.text])).toEqual([
      ['code', 'not-met', essentials, 'The joint is welded to ASME BPVC Section IX; an AWS D1.1 test does not qualify it.'],
      ['process', 'met', essentials, 'SMAW was tested.'],
      ['f-number', 'not-met', 'Clause 6 electrode groups table (Table 4.13 in 2015)', 'Production electrode group F4: the test (electrode group F3) does not qualify it.'], // a group qualifies itself and lower ones
      ['progression', 'not-met', essentials, 'Production downhill vertical: the test (uphill vertical) does not qualify it.'],
      ['backing', 'not-met', essentials, 'Production without backing: the test (with backing) does not qualify it.'],
      ['weld', 'met', 'Table 6.10', 'A groove test qualifies groove welds.'],
      ['position', 'met', 'Table 6.10', 'Groove V: the test qualifies F, H, V.'], // 3G row (§B4)
      ['thickness', 'not-met', 'Table 6.11', 'Thickness 0.8 in: qualified 1/8 in to 3/4 in.'], // 3/8 in plate (§B1)
    ])
  })
})
