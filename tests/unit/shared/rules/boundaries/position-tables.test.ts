// Position tables checked against the published rows written out here as data (not against the code's
// own union of rows). Each table names its section of docs/sources.md, with the edition and page read.
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

type Letters = string[]
const ALL = ['F', 'H', 'V', 'O']

/**
 * ASME BPVC IX Table QW-461.9 as printed in the about-2010 copies (docs/sources.md §A3: ru.scribd 365768748,
 * corroborated by ru.scribd 394232648). Columns: A groove on plate and pipe over 24 in OD; B groove on pipe
 * of 24 in OD or less; C fillet. Pipe fillet rows are from memory ([M]).
 */
const qw4619: Record<string, { a: Letters, b: Letters, c: Letters }> = {
  'plate-groove 1G': { a: ['F'], b: ['F'], c: ['F'] },
  'plate-groove 2G': { a: ['F', 'H'], b: ['F', 'H'], c: ['F', 'H'] },
  'plate-groove 3G': { a: ['F', 'V'], b: ['F'], c: ['F', 'H', 'V'] },
  'plate-groove 4G': { a: ['F', 'O'], b: ['F'], c: ['F', 'H', 'O'] },
  'plate-groove 3G+4G': { a: ['F', 'V', 'O'], b: ['F'], c: ALL },
  'plate-groove 2G+3G+4G': { a: ALL, b: ['F', 'H'], c: ALL },
  'pipe-groove 1G': { a: ['F'], b: ['F'], c: ['F'] },
  'pipe-groove 2G': { a: ['F', 'H'], b: ['F', 'H'], c: ['F', 'H'] },
  'pipe-groove 5G': { a: ['F', 'V', 'O'], b: ['F', 'V', 'O'], c: ALL },
  'pipe-groove 6G': { a: ALL, b: ALL, c: ALL },
  'pipe-groove 2G+5G': { a: ALL, b: ALL, c: ALL },
  'plate-fillet 1F': { a: [], b: [], c: ['F'] },
  'plate-fillet 2F': { a: [], b: [], c: ['F', 'H'] },
  'plate-fillet 3F': { a: [], b: [], c: ['F', 'H', 'V'] },
  'plate-fillet 4F': { a: [], b: [], c: ['F', 'H', 'O'] },
  'plate-fillet 3F+4F': { a: [], b: [], c: ALL },
  // [M] pipe fillet rows
  'pipe-fillet 1F': { a: [], b: [], c: ['F'] },
  'pipe-fillet 2F': { a: [], b: [], c: ['F', 'H'] },
  'pipe-fillet 2FR': { a: [], b: [], c: ['F', 'H'] },
  'pipe-fillet 4F': { a: [], b: [], c: ['F', 'H', 'O'] },
  'pipe-fillet 5F': { a: [], b: [], c: ALL },
}

function asmeRow(key: string) {
  const [kind, tests] = key.split(' ') as [string, string]
  const [form, weld] = kind.split('-') as ['plate' | 'pipe', 'groove' | 'fillet']
  const r = ok({
    code: 'asme-ix', check: 'welder-ranges', unit: 'in',
    input: { process: 'SMAW', form, weld, testPositions: tests.split('+'), couponThickness: 0.375, ...(form === 'pipe' ? { outsideDiameter: 6.625 } : {}) },
  })
  return r.positions as { groove: Letters, groovePipe?: Letters, fillet: Letters }
}

const sorted = (letters: Letters) => ALL.filter(l => letters.includes(l))

describe('ASME QW-461.9, every published row (docs/sources.md §A3)', () => {
  it.each(Object.entries(qw4619))('%s → A %j, B %j, C %j', (key, row) => {
    const p = asmeRow(key)
    expect(p.fillet).toEqual(row.c)
    if (key.includes('groove')) {
      expect(p.groove).toEqual(row.a)
      expect(p.groovePipe).toEqual(row.b)
    }
    else {
      expect(p.groove).toEqual([])
    }
  })

  it('property: any set of plate groove tests qualifies at least the union of the published single rows, and never a letter outside it (row data above)', () => {
    const singles = ['1G', '2G', '3G', '4G']
    fc.assert(fc.property(fc.subarray(singles, { minLength: 1 }), (tests) => {
      const p = asmeRow(`plate-groove ${tests.join('+')}`)
      const union = (col: 'a' | 'b' | 'c') => sorted(tests.flatMap(t => qw4619[`plate-groove ${t}`]![col]))
      expect(p.groove).toEqual(union('a'))
      expect(p.groovePipe).toEqual(union('b'))
      expect(p.fillet).toEqual(union('c'))
    }), { numRuns: 30 })
  })

  it('a 1G groove test does not qualify vertical or overhead fillets (no test that only checks the set is non-empty)', () => {
    const p = asmeRow('plate-groove 1G')
    expect(p.fillet.length).toBeGreaterThan(0)
    expect(p.fillet).not.toContain('V')
    expect(p.fillet).not.toContain('O')
  })
})

/** AWS D1.1:2020 Table 6.10 plate rows (docs/sources.md §B4: scribd AWS-D1-1-SECTION-6). CJP = PJP for these rows. */
const table610: Record<string, { groove: Letters, fillet: Letters }> = {
  'groove 1G': { groove: ['F'], fillet: ['F', 'H'] },
  'groove 2G': { groove: ['F', 'H'], fillet: ['F', 'H'] },
  'groove 3G': { groove: ['F', 'H', 'V'], fillet: ['F', 'H', 'V'] },
  'groove 4G': { groove: ['F', 'O'], fillet: ['F', 'H', 'O'] },
  'groove 3G+4G': { groove: ALL, fillet: ALL },
  'fillet 1F': { groove: [], fillet: ['F'] },
  'fillet 2F': { groove: [], fillet: ['F', 'H'] },
  'fillet 3F': { groove: [], fillet: ['F', 'H', 'V'] },
  'fillet 4F': { groove: [], fillet: ['F', 'H', 'O'] },
  'fillet 3F+4F': { groove: [], fillet: ALL },
}

describe('AWS D1.1 Table 6.10 plate rows (docs/sources.md §B4)', () => {
  it.each(Object.entries(table610))('%s → groove %j, fillet %j', (key, row) => {
    const [weld, tests] = key.split(' ') as [string, string]
    const r = ok({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld, testPositions: tests.split('+'), couponThickness: 0.375 } })
    const p = r.positions as { groove: Letters, fillet: Letters }
    expect(p.fillet).toEqual(row.fillet)
    if (weld === 'groove') expect(p.groove).toEqual(row.groove)
  })
  it('Table 10.12 pipe fillet rows read: 4F → F, H, OH; 5F → all (docs/sources.md §B2)', () => {
    const f = (t: string) => (ok({ code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: [t], couponThickness: 0.375, outsideDiameter: 6.625 } }).positions as { fillet: Letters }).fillet
    expect(f('4F')).toEqual(['F', 'H', 'O'])
    expect(f('5F')).toEqual(ALL)
  })
})

/** ISO 9606-1:2012 Table 9 butt rows (docs/sources.md §C9: summary sheet S1 of DIN EN ISO 9606-1:2013). */
const table9: Record<string, string[]> = {
  'PA': ['PA'],
  'PC': ['PA', 'PC'],
  'PE': ['PA', 'PC', 'PE'],
  'PF': ['PA', 'PF'],
  'PG': ['PG'],
  'PH': ['PA', 'PE', 'PF', 'PH'],
  'PJ': ['PA', 'PE', 'PG', 'PJ'],
  'H-L045': ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'],
  'J-L045': ['PA', 'PC', 'PE', 'PG', 'PJ', 'J-L045'],
}

describe('ISO 9606-1 Table 9 and Table 10 (docs/sources.md §C9, §C10)', () => {
  it.each(Object.entries(table9))('butt %s → %j', (test, expected) => {
    const r = ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', form: 'pipe', weld: 'groove', testPositions: [test], depositThickness: 5, outsideDiameter: 168 } })
    expect([...(r.positions as { groove: string[] }).groove].sort()).toEqual([...expected].sort())
  })
  it('PC with PH on pipe adds H-L045; PC with PJ adds J-L045 (S1 combinations)', () => {
    const g = (tests: string[]) => (ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', form: 'pipe', weld: 'groove', testPositions: tests, depositThickness: 5, outsideDiameter: 168 } }).positions as { groove: string[] }).groove
    expect(g(['PC', 'PH'])).toContain('H-L045')
    expect(g(['PC', 'PH'])).not.toContain('J-L045')
    expect(g(['PC', 'PJ'])).toContain('J-L045')
    expect(g(['PH'])).not.toContain('H-L045')
  })
  it.each([['PA', ['PA']], ['PB', ['PA', 'PB']]] as [string, string[]][])('fillet %s → %j (S1, S2 example 1)', (test, expected) => {
    const r = ok({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', form: 'plate', weld: 'fillet', testPositions: [test], couponThickness: 10 } })
    expect((r.positions as { fillet: string[] }).fillet).toEqual(expected)
  })
})
