import { describe, expect, it } from 'vitest'
import { ok, refused } from '../helpers'
import { buttPositions, filletPositions } from '../../../../../shared/rules/iso-9606-1/positions'
import { fillerGroupsQualified } from '../../../../../shared/rules/iso-9606-1/welder-ranges'

// ISO 9606-1 welder ranges, answer by answer and limit by limit (edition 2012; EN ISO 9606-1:2017 the same text).
// Sources, docs/sources.md: §C6 Table 6 (s under 3 mm: s to 2s; 3 to under 12 mm: 3 mm to 2s; 12 mm and over: 3 mm and
// up; 311 uses 1.5 in place of 2), §C7 Table 7 (t under 3 mm: t to 3 mm, from memory; 3 mm and over: 3 mm and up),
// §C8 Table 8 (D up to 25 mm: D to 2D; over 25 mm: 0.5D and up, at least 25 mm, read), §C9, §C10. Process groups
// (135 covers 138; 141, 143, 145 each other) and the 500 mm plate-to-pipe limit: summary sheet S1 (partial). Filler
// groups (FM1 ↔ FM2, FM3 → FM1–FM3, FM4 → FM1, FM2, FM4, FM5 and FM6 alone): from memory, as the rule says.
// Sentences are Rootface's.
const wr = (input: Record<string, unknown>) => ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input })
const no = (input: Record<string, unknown>) => refused({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input })
const butt = (s: number, process = '111') => wr({ process, form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: s })
const fillet = (t: number) => wr({ process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: t })
const texts = (r: Record<string, unknown>) => (r.reasons as { clause: string, text: string, basis: string }[]).map(x => [x.clause, x.text, x.basis])

// Table 6 (§C6), factor 2: [s, min, max]; max null = no upper limit.
const table6: [number, number, number | null][] = [
  [2.9, 2.9, 5.8], // under 3 mm: s to 2s
  [3, 3, 6], // 3 mm: 3 mm to 2s
  [3.1, 3, 6.2],
  [11.9, 3, 23.8], // just under 12 mm: still 2s
  [12, 3, null], // 12 mm and over: 3 mm and up (breakpoint from memory)
  [12.1, 3, null],
]
// Table 7 (§C7): [t, min, max].
const table7: [number, number, number | null][] = [
  [2.9, 2.9, 3], // under 3 mm: t to 3 mm (from memory)
  [3, 3, null], // 3 mm and over: 3 mm and up (partly read, S2 example 1)
  [3.1, 3, null],
]
// Table 8 (§C8): [D, min, max].
const table8: [number, number, number | null][] = [
  [24.9, 24.9, 49.8], // up to 25 mm: D to 2D
  [25, 25, 50],
  [25.1, 25, null], // over 25 mm: 0.5D, at least 25 mm
  [50, 25, null], // 0.5D = 25 mm exactly
  [50.2, 25.1, null], // 0.5D = 25.1 mm
  [60, 30, null],
]

describe('ISO 9606-1 Table 6 below, at and above each limit (§C6)', () => {
  it.each(table6)('s = %s mm qualifies %s to %s mm', (s, min, max) => {
    expect(butt(s).thickness).toEqual({ min, max })
  })
  it('the Table 6 reason names the range, the factor and the source of the 12 mm band', () => {
    expect(texts(butt(2.9))[1]).toEqual(['ISO 9606-1 Table 6', 'Butt weld, deposit s = 2.9 mm: 2.9 mm to 5.8 mm (factor 2; s of 12 mm and over: 3 mm and over, from one worked example).', 'partial'])
    expect(texts(butt(12))[1]).toEqual(['ISO 9606-1 Table 6', 'Butt weld, deposit s = 12 mm: 3 mm to unlimited (factor 2; s of 12 mm and over: 3 mm and over, from one worked example).', 'partial'])
  })
  it('gas welding 311: factor 1.5 under 12 mm (2 mm → 2 to 3 mm, 11.9 → 3 to 17.85 mm); at 12 mm the range is refused, not guessed', () => {
    expect(butt(2, '311').thickness).toEqual({ min: 2, max: 3 })
    expect(butt(11.9, '311').thickness).toEqual({ min: 3, max: 17.85 })
    expect(texts(butt(4, '311'))[1]![1]).toContain('factor 1.5 for gas welding')
    expect(no({ process: '311', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 12 })).toBe('depositThickness: the Table 6 range for gas welding (311) at s of 12 mm and over is not carried')
  })
  it('without a deposit the coupon thickness stands for s', () => {
    expect(wr({ process: '111', form: 'plate', weld: 'groove', testPositions: ['PA'], couponThickness: 5 }).thickness).toEqual({ min: 3, max: 10 })
  })
})

describe('ISO 9606-1 Table 7 and Table 8 below, at and above each limit (§C7, §C8)', () => {
  it.each(table7)('fillet on t = %s mm qualifies %s to %s mm', (t, min, max) => {
    expect(fillet(t).thickness).toEqual({ min, max })
  })
  it('the Table 7 reason says t to 3 mm (from memory) or 3 mm and over (partly read)', () => {
    expect(texts(fillet(2.9))[1]).toEqual(['ISO 9606-1 Table 7', 'Fillet test on t = 2.9 mm: t to 3 mm.', 'memory'])
    expect(texts(fillet(3))[1]).toEqual(['ISO 9606-1 Table 7', 'Fillet test on t = 3 mm: 3 mm and over.', 'partial'])
  })
  it.each(table8)('pipe D = %s mm qualifies %s to %s mm', (D, min, max) => {
    const r = wr({ process: '141', form: 'pipe', weld: 'groove', testPositions: ['PA'], depositThickness: 3, outsideDiameter: D })
    expect(r.diameter).toEqual({ min, max })
  })
  it('a pipe over 25 mm says it also covers plate; 25 mm does not', () => {
    const text = (D: number) => texts(wr({ process: '141', form: 'pipe', weld: 'groove', testPositions: ['PA'], depositThickness: 3, outsideDiameter: D })).find(x => x[0] === 'ISO 9606-1 Table 8')
    expect(text(25)).toEqual(['ISO 9606-1 Table 8', 'Pipe D = 25 mm: 25 mm to 50 mm.', 'verified'])
    expect(text(25.1)).toEqual(['ISO 9606-1 Table 8', 'Pipe D = 25.1 mm: 25 mm to unlimited; a pipe over 25 mm also covers plate.', 'verified'])
  })
})

describe('ISO 9606-1 answers with gaps, groups and refusals', () => {
  it('a pipe butt test without deposit or diameter: positions still given, both gaps named', () => {
    const r = wr({ process: '141', form: 'pipe', weld: 'groove', testPositions: ['PH'] })
    expect(r.thickness).toBeUndefined()
    expect(r.diameter).toBeUndefined()
    expect(r.positions).toEqual({ groove: ['PA', 'PE', 'PF', 'PH'], fillet: [] }) // Table 9 PH row, §C9 read
    expect(r.undetermined).toEqual([
      { field: 'depositThickness', needed: 'ISO 9606-1 Table 6: a butt weld is ranged by its deposited thickness s (per process s1, s2; the combination by s1 + s2)' },
      { field: 'outsideDiameter', needed: 'ISO 9606-1 Table 8: the pipe outside diameter D' },
    ])
    expect(texts(r)).toEqual([
      ['ISO 9606-1 process and transfer (summary sheet)', 'Process 141 qualifies 141, 143, 145.', 'partial'],
      ['ISO 9606-1 Table 9', 'Butt weld positions: PA, PE, PF, PH.', 'partial'],
    ])
  })
  it('a combination test without each deposit names processes[].depositThickness', () => {
    const r = wr({ form: 'plate', weld: 'groove', testPositions: ['PA'], processes: [{ process: '141', depositThickness: 3 }, { process: '111' }] })
    expect(r.undetermined).toEqual([expect.objectContaining({ field: 'processes[].depositThickness' })])
    expect(r.deposits).toEqual([{ process: '141', depositMax: 6, clause: 'ISO 9606-1 Table 6 (per process s)' }, { process: '111', clause: 'ISO 9606-1 Table 6 (per process s)' }])
    expect(r).not.toHaveProperty('combinedDepositMax')
  })
  it('a combination 141 s3 + 111 s9: each s its own 2s, the sum s1 + s2 = 12 mm has no upper limit (§C6)', () => {
    const r = wr({ form: 'plate', weld: 'groove', testPositions: ['PA'], processes: [{ process: '141', depositThickness: 3 }, { process: '111', depositThickness: 9 }] })
    expect(r.thickness).toEqual({ min: 3, max: null })
    expect(r.deposits).toEqual([{ process: '141', depositMax: 6, clause: 'ISO 9606-1 Table 6 (per process s)' }, { process: '111', depositMax: 18, clause: 'ISO 9606-1 Table 6 (per process s)' }])
    expect(r.combinedDepositMax).toBeNull()
    const under = wr({ form: 'plate', weld: 'groove', testPositions: ['PA'], processes: [{ process: '141', depositThickness: 3 }, { process: '111', depositThickness: 8.9 }] })
    expect(under.combinedDepositMax).toBe(23.8)
  })
  it('a fillet test without t: positions given, t named as the gap', () => {
    const r = wr({ process: '135', form: 'plate', weld: 'fillet', testPositions: ['PB'] })
    expect(r.thickness).toBeUndefined()
    expect(r.positions).toEqual({ groove: [], fillet: ['PA', 'PB'], filletPipeMinDiameter: 500 })
    expect(r.undetermined).toEqual([{ field: 'couponThickness', needed: 'ISO 9606-1 Table 7: a fillet test is ranged by the plate thickness t' }])
    expect(texts(r)).toContainEqual(['ISO 9606-1 Table 10', 'Fillet positions: PA, PB.', 'partial'])
  })
  it('a fillet row from memory says so when no thickness is given either', () => {
    const r = wr({ process: '135', form: 'plate', weld: 'fillet', testPositions: ['PF'] })
    expect(texts(r)).toContainEqual(['ISO 9606-1 Table 10', 'Fillet positions: PA, PB, PF.', 'memory'])
  })
  it.each([
    [1, ['FM1', 'FM2'], 'partial'], [2, ['FM1', 'FM2'], 'memory'], [3, ['FM1', 'FM2', 'FM3'], 'memory'],
    [4, ['FM1', 'FM2', 'FM4'], 'memory'], [5, ['FM5'], 'memory'], [6, ['FM6'], 'memory'],
  ] as [number, string[], string][])('filler group FM%s qualifies %j (basis %s)', (fm, groups, basis) => {
    const r = wr({ process: '111', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10, fNumber: fm })
    expect(r.fillerGroups).toEqual(groups)
    expect(texts(r)).toContainEqual(['ISO 9606-1 filler groups', `Filler group FM${fm} qualifies ${groups.join(', ')}.`, basis])
  })
  it('FM7 is refused with the group list (FM0 already fails the input schema; the rule itself refuses it too)', () => {
    expect(() => fillerGroupsQualified(0)).toThrow('fNumber: FM0 is not an ISO 9606-1 filler material group (FM1 to FM6)')
    for (const fm of [7]) expect(no({ process: '111', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10, fNumber: fm })).toBe(`fNumber: FM${fm} is not an ISO 9606-1 filler material group (FM1 to FM6)`)
  })
  it('processes: 135 covers 138, 141/143/145 each other, the others only themselves; an unknown number is refused', () => {
    const p = (process: string) => wr({ process, form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 }).processes
    expect(p('135')).toEqual(['135', '138'])
    expect(p('138')).toEqual(['138'])
    expect(p('143')).toEqual(['141', '143', '145'])
    expect(p('145')).toEqual(['141', '143', '145'])
    expect(p('136')).toEqual(['136'])
    expect(p(' 111 ')).toEqual(['111'])
    expect(no({ process: '999', form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 })).toBe('process: "999" is not an ISO 4063 process number carried for ISO 9606-1 (111, 114, 121, 125, 131, 135, 136, 138, 141, 142, 143, 145, 15, 311)')
  })
  it('transfer: short-circuit on 131, 135 and 138 qualifies every mode; on 136 or any other mode only itself', () => {
    const t = (process: string, transfer: string) => {
      const r = wr({ process, transfer, form: 'plate', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 })
      return [r.transfers, texts(r)[1]![1]]
    }
    expect(t('131', 'short-circuit')).toEqual([['short-circuit', 'globular', 'spray', 'pulse'], 'Short-circuit transfer (D) qualifies all other transfer modes.'])
    expect(t('138', 'short-circuit')[0]).toEqual(['short-circuit', 'globular', 'spray', 'pulse'])
    expect(t('136', 'short-circuit')).toEqual([['short-circuit'], 'short-circuit transfer qualifies that mode only.'])
    expect(t('135', 'spray')).toEqual([['spray'], 'spray transfer qualifies that mode only.'])
  })
  it('refusals: no position, an unknown butt or fillet position, with the table\'s list', () => {
    // an empty list already fails the input schema; the table functions refuse it on their own too
    expect(() => buttPositions([], true)).toThrow('testPositions: give at least one test position')
    expect(() => filletPositions([])).toThrow('testPositions: give at least one test position')
    expect(no({ process: '111', form: 'plate', weld: 'groove', testPositions: ['PB'], depositThickness: 5 })).toBe('testPositions: PB is not a butt-weld test position of ISO 9606-1 Table 9 (PA, PC, PE, PF, PG, PH, PJ, H-L045, J-L045)')
    expect(no({ process: '111', form: 'plate', weld: 'fillet', testPositions: ['PE'], couponThickness: 5 })).toBe('testPositions: PE is not a fillet test position carried for ISO 9606-1 Table 10 (PA, PB, PD, PF, PG, PH, PJ)')
  })
  it('Table 9 on pipe: PC + PH adds H-L045, PC + PJ adds J-L045; on plate neither (§C9)', () => {
    const g = (tests: string[], form: string) => (wr({ process: '141', form, weld: 'groove', testPositions: tests, depositThickness: 3, outsideDiameter: 60 }).positions as { groove: string[] }).groove
    expect(g(['PC', 'PH'], 'pipe')).toEqual(['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'])
    expect(g(['pc', 'pj'], 'pipe')).toEqual(['PA', 'PC', 'PE', 'PG', 'PJ', 'J-L045'])
    expect(g(['PC', 'PH'], 'plate')).toEqual(['PA', 'PC', 'PE', 'PF', 'PH'])
    expect(g(['PC', 'PJ'], 'plate')).toEqual(['PA', 'PC', 'PE', 'PG', 'PJ'])
    expect(g(['PH'], 'pipe')).toEqual(['PA', 'PE', 'PF', 'PH'])
    expect(g(['PC'], 'pipe')).toEqual(['PA', 'PC'])
  })
})
