import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// Whole ISO 9606-1 welder answers, reason by reason (edition 2012; EN ISO 9606-1:2017 the same text). Values:
// Table 6, s = 10 mm → 3 to 20 mm, s = 5 mm → 3 to 10 mm (docs/sources.md §C6, factor 2 in the 3–12 mm band); Table 8,
// D = 60 mm → 0.5D = 30 mm and over (§C8, read); Table 9, PF → PA, PF and H-L045 → PA, PC, PE, PF, PH, H-L045
// (§C9, read); 141 covering 143 and 145 and the 500 mm plate-to-pipe limit: summary sheet S1 (partial). Sentences: Rootface's.
const iso = (check: string, input: unknown) => ok({ code: 'iso-9606-1', check, unit: 'mm', input })
const plate = { process: '111', form: 'plate', weld: 'groove', testPositions: ['PF'], couponThickness: 10, depositThickness: 10 }

describe('ISO 9606-1 welder ranges, reason by reason', () => {
  it('111 P BW s10 PF', () => {
    const r = iso('welder-ranges', plate)
    expect(r).toMatchObject({ positions: { groove: ['PA', 'PF'], fillet: [], groovePipeMinDiameter: 500 }, processes: ['111'], thickness: { min: 3, max: 20 } })
    expect(r.reasons).toEqual([
      { clause: 'ISO 9606-1 process and transfer (summary sheet)', text: 'Process 111 qualifies 111.', basis: 'partial' },
      { clause: 'ISO 9606-1 Table 6', text: 'Butt weld, deposit s = 10 mm: 3 mm to 20 mm (factor 2; s of 12 mm and over: 3 mm and over, from one worked example).', basis: 'partial' },
      { clause: 'ISO 9606-1 Table 9', text: 'Butt weld positions: PA, PF.', basis: 'partial' },
      { clause: 'ISO 9606-1 butt and fillet welds (summary sheet)', text: 'A butt-weld test qualifies fillet welds only with a supplementary fillet test (10 mm plate or the minimum thickness, single layer, PB).', basis: 'partial' },
      { clause: 'ISO 9606-1 5.3', text: 'A plate test covers pipe over 500 mm (one summary sheet reads 500 mm and over), and rotating pipe over 75 mm in PA, PB, PC and PD.', basis: 'partial' },
    ])
  })
  it('141 T BW s5 D60 H-L045', () => {
    const r = iso('welder-ranges', { process: '141', form: 'pipe', weld: 'groove', testPositions: ['H-L045'], couponThickness: 5, depositThickness: 5, outsideDiameter: 60 })
    expect(r).toMatchObject({ positions: { groove: ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'], fillet: [] }, processes: ['141', '143', '145'], thickness: { min: 3, max: 10 }, diameter: { min: 30, max: null } })
    expect(r.positions).not.toHaveProperty('groovePipeMinDiameter')
    expect((r.reasons as { clause: string, text: string }[]).map(x => x.text)).toEqual([
      'Process 141 qualifies 141, 143, 145.',
      'Butt weld, deposit s = 5 mm: 3 mm to 10 mm (factor 2; s of 12 mm and over: 3 mm and over, from one worked example).',
      'Butt weld positions: PA, PC, PE, PF, PH, H-L045.',
      'A butt-weld test qualifies fillet welds only with a supplementary fillet test (10 mm plate or the minimum thickness, single layer, PB).',
      'Pipe D = 60 mm: 30 mm to unlimited; a pipe over 25 mm also covers plate.',
    ])
  })
})

describe('ISO 9606-1 coverage, variable by variable', () => {
  it('a PF plate test against a PC butt weld on 100 mm pipe, 25 mm: position, thickness and product refused, none passed by guess', () => {
    const r = iso('covers', { test: plate, production: { process: '111', form: 'pipe', weld: 'groove', position: 'PC', thickness: 25, outsideDiameter: 100 } })
    expect([r.covered, r.answer, r.record]).toEqual([false, 'not-covered', []])
    expect((r.reasons as { variable: string, state: string, clause: string, text: string }[]).map(x => [x.variable, x.state, x.clause, x.text])).toEqual([
      ['process', 'met', 'ISO 9606-1, 5.2', 'Process 111 is covered by the 111 test.'],
      ['weld', 'met', 'ISO 9606-1, 5.4', 'A butt test covers butt welds.'],
      ['position', 'not-met', 'ISO 9606-1 Table 9', 'Position PC: the test covers PA, PF.'],
      ['thickness', 'not-met', 'ISO 9606-1 Table 6', 'Thickness 25 mm: covered 3 mm to 20 mm.'],
      ['product', 'not-met', 'ISO 9606-1, 5.3', 'A plate test covers pipe of D 100 mm only when it is rotated (over 75 mm, in PA, PB, PC or PD); that is not decided here.'],
    ])
  })
  it('the same test covers a PF butt weld on plate of 20 mm, and not 20.1 mm (Table 6 upper limit 2s)', () => {
    const at = (thickness: number) => iso('covers', { test: plate, production: { process: '111', form: 'plate', weld: 'groove', position: 'PF', thickness } })
    expect(at(20).covered).toBe(true)
    expect(at(20.1).covered).toBe(false)
    expect(at(3).covered).toBe(true)
    expect(at(2.9).covered).toBe(false)
  })
})
