// Details of the answers that mutation testing showed no test looked at (npm run test:mutation survivors):
// deposits in each QW-451.1 band, the reasons that must or must not appear, ISO processes and transfers,
// and the D1.1 bend wording. Each names its section of docs/sources.md.
import { describe, expect, it } from 'vitest'
import { describeLetters, qw4619 } from '../../../../../shared/rules/asme-ix/positions'
import { ok, refused } from '../helpers'

interface Reason { clause: string, text: string, basis: string }
const procedure = (input: Record<string, unknown>, unit: 'in' | 'mm' = 'in') => ok({ code: 'asme-ix', check: 'procedure-ranges', unit, input })
const clauses = (r: { reasons: unknown }) => (r.reasons as Reason[]).map(x => x.clause)

describe('QW-451.1 deposit 2t in every band (docs/sources.md §A1)', () => {
  it.each([
    [0.05, 0.05, 0.1], [0.25, 0.25, 0.5], [0.25, 0.1, 0.2], [0.5, 0.25, 0.5], [2, 0.5, 1], [7, 0.5, 1],
  ])('T = %s in, t = %s in → deposit up to %s in', (T, t, max) => {
    expect(procedure({ process: 'SMAW', couponThickness: T, depositThickness: t }).depositMax).toBeCloseTo(max, 6)
  })
  it('without a deposit thickness the coupon is taken as t, and the answer says so (a convention, not the code)', () => {
    expect((procedure({ process: 'SMAW', couponThickness: 0.5 }).reasons as Reason[]).filter(r => r.basis === 'convention')).toHaveLength(1)
    expect((procedure({ process: 'SMAW', couponThickness: 0.5, depositThickness: 0.5 }).reasons as Reason[]).filter(r => r.basis === 'convention')).toHaveLength(0)
  })
  it('Note (5) side bends in lieu of face and root: from 3/8 in while face and root bends apply, not below, not where side bends already are', () => {
    expect(clauses(procedure({ process: 'SMAW', couponThickness: 0.374 }))).not.toContain('QW-451.1 Note (5)')
    expect(clauses(procedure({ process: 'SMAW', couponThickness: 0.375 }))).toContain('QW-451.1 Note (5)')
    expect(clauses(procedure({ process: 'SMAW', couponThickness: 10 }, 'mm'))).toContain('QW-451.1 Note (5)')
    expect(clauses(procedure({ process: 'SMAW', couponThickness: 1 }))).not.toContain('QW-451.1 Note (5)')
  })
  it('QW-403.9 only when a pass over 1/2 in is given', () => {
    expect(clauses(procedure({ process: 'SAW', couponThickness: 1 }))).not.toContain('QW-403.9')
    expect(clauses(procedure({ process: 'SAW', couponThickness: 1, maxPassThickness: 0.5 }))).not.toContain('QW-403.9')
  })
})

describe('QW-461.9 in words and the † footnote (docs/sources.md §A3)', () => {
  const reasonText = (input: Record<string, unknown>) => (ok({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', input }).reasons as Reason[]).map(r => r.text).join(' | ')
  it('6G reads "all positions", 2G reads "F, H"', () => {
    expect(reasonText({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.25, outsideDiameter: 6 })).toContain('all positions (F, H, V, O)')
    const twoG = reasonText({ process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['2G'], couponThickness: 0.25, outsideDiameter: 6 })
    expect(twoG).toContain('F, H')
    expect(twoG).not.toContain('all positions')
  })
  it('describeLetters: none, all, or the letters', () => {
    expect(describeLetters([])).toBe('none')
    expect(describeLetters(['F', 'H', 'V', 'O'])).toBe('all positions (F, H, V, O)')
    expect(describeLetters(['F', 'V', 'O'])).toBe('F, V, O')
  })
  it('the † pipe-diameter footnote belongs to plate groove (column B) and plate fillet (column C) tests only', () => {
    expect(qw4619('plate', 'groove', ['1G'])).toMatchObject({ groovePipeDagger: true, filletPipeDagger: false })
    expect(qw4619('plate', 'fillet', ['1F'])).toMatchObject({ groovePipeDagger: false, filletPipeDagger: true })
    expect(qw4619('pipe', 'groove', ['1G'])).toMatchObject({ groovePipeDagger: false, filletPipeDagger: false })
    expect(qw4619('pipe', 'fillet', ['1F'])).toMatchObject({ groovePipeDagger: false, filletPipeDagger: false })
  })
  it('pipe fillet rows are marked from memory, plate rows are not', () => {
    expect(qw4619('pipe', 'fillet', ['2FR']).fromMemory).toBe(true)
    expect(qw4619('plate', 'groove', ['2G']).fromMemory).toBe(false)
  })
  it('an unknown test position is refused naming the table', () => {
    expect(refused({ code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['5F'], couponThickness: 0.375 } })).toContain('QW-461.9')
  })
})

describe('AWS D1.1 bend wording and several specimens (docs/sources.md §B3)', () => {
  const run = (specimens: unknown[], unit: 'in' | 'mm' = 'in') => ok({ code: 'aws-d1.1', check: 'bend', unit, input: { specimens } })
  it('one failed specimen of two fails the test', () => {
    const r = run([{ type: 'face', indications: [] }, { type: 'root', indications: [{ size: 0.2 }] }])
    expect(r.accepted).toBe(false)
    expect((r.specimens as { accepted: boolean }[]).map(s => s.accepted)).toEqual([true, false])
  })
  it('each specimen is named by its type; corner cracks are reported by the largest', () => {
    const specimens = run([{ type: 'side', indications: [{ size: 0.1, atCorner: true }, { size: 0.2, atCorner: true }] }]).specimens as { reason: string }[]
    expect(specimens[0]!.reason).toMatch(/^side bend: /)
    expect(specimens[0]!.reason).toContain('corner cracks up to 0.2 in')
  })
  it('an indication from an internal defect at a corner is judged as a surface one, not reported as a corner crack', () => {
    const specimens = run([{ type: 'side', indications: [{ size: 0.1, atCorner: true, fromInternalDefect: true }] }]).specimens as { reason: string }[]
    expect(specimens[0]!.reason).not.toContain('corner')
  })
  it('the limits are read in inches; the SI values are from memory (partly read)', () => {
    expect((run([{ type: 'face', indications: [] }]).reasons as Reason[])[0]!.basis).toBe('verified')
    expect((run([{ type: 'face', indications: [] }], 'mm').reasons as Reason[])[0]!.basis).toBe('partial')
  })
})

describe('ISO 9606-1 processes, transfers, filler groups and plate/pipe (docs/sources.md §C)', () => {
  const iso = (input: Record<string, unknown>) => ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 5, ...input } })
  it.each([
    ['135', ['135', '138']], ['141', ['141', '143', '145']], ['143', ['141', '143', '145']], ['111', ['111']],
  ] as [string, string[]][])('process %s covers %j (summary sheet)', (process, covered) => {
    expect(iso({ process }).processes).toEqual(covered)
  })
  it('short-circuit transfer with 131, 135 or 138 covers every mode; otherwise only the mode tested', () => {
    expect(iso({ process: '135', transfer: 'short-circuit' }).transfers).toEqual(['short-circuit', 'globular', 'spray', 'pulse'])
    expect(iso({ process: '141', transfer: 'short-circuit' }).transfers).toEqual(['short-circuit'])
    expect(iso({ process: '135', transfer: 'spray' }).transfers).toEqual(['spray'])
    expect(iso({ process: '135' }).transfers).toBeUndefined()
  })
  it('a butt test qualifies no fillet positions by itself; a fillet test no butt positions', () => {
    expect((iso({ process: '135' }).positions as { fillet: string[] }).fillet).toEqual([])
    expect((iso({ process: '135', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 }).positions as { groove: string[] }).groove).toEqual([])
  })
  it('a plate test covers pipe over 500 mm, on the column of its weld type (5.3)', () => {
    expect(iso({ process: '135' }).positions).toMatchObject({ groovePipeMinDiameter: 500 })
    expect(iso({ process: '135' }).positions).not.toHaveProperty('filletPipeMinDiameter')
    expect(iso({ process: '135', weld: 'fillet', testPositions: ['PB'], couponThickness: 10 }).positions).toMatchObject({ filletPipeMinDiameter: 500 })
  })
  it('Table 7: the t under 3 mm row is from memory, the 3 mm row partly read', () => {
    const basis = (t: number) => (iso({ process: '135', weld: 'fillet', testPositions: ['PB'], couponThickness: t }).reasons as Reason[]).find(r => r.clause === 'ISO 9606-1 Table 7')!.basis
    expect(basis(2.9)).toBe('memory')
    expect(basis(3)).toBe('partial')
  })
  it('Table 8: only a pipe over 25 mm also covers plate', () => {
    const text = (D: number) => (iso({ process: '141', form: 'pipe', outsideDiameter: D }).reasons as Reason[]).find(r => r.clause === 'ISO 9606-1 Table 8')!.text
    expect(text(25)).not.toContain('covers plate')
    expect(text(25.1)).toContain('covers plate')
  })
  it('filler group FM1 covers FM1 and FM2 (S2, partial); the other groups are answered from memory and say so', () => {
    expect(iso({ process: '135', fNumber: 1 }).fillerGroups).toEqual(['FM1', 'FM2'])
    const basis = (fm: number) => (iso({ process: '135', fNumber: fm }).reasons as Reason[]).find(r => r.clause === 'ISO 9606-1 filler groups')!.basis
    expect(basis(1)).toBe('partial')
    for (const fm of [2, 3, 4, 5, 6]) expect(basis(fm), `FM${fm}`).toBe('memory')
    // from memory (ISO 9606-1 Table 3): FM5 and FM6 qualify only themselves
    expect(iso({ process: '135', fNumber: 5 }).fillerGroups).toEqual(['FM5'])
    expect(refused({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 5, fNumber: 7 } })).toContain('FM7')
  })
})
