import { describe, expect, it } from 'vitest'
import { qw4231 } from '../../../../../shared/rules/asme-ix/base-metals'
import { qw433 } from '../../../../../shared/rules/asme-ix/f-numbers'
import { pNo, qw4241 } from '../../../../../shared/rules/asme-ix/qw-424'

// The number groups written out as data here, each row from its source, and compared member by member with the code:
// QW-423.1 welder base-metal groups since 2015 (docs/sources.md §A6, read in the 2015 and 2023 editions) and before 2015
// (older edition, training copy); QW-433 F-No. groups (§A6: partly read on an about-2010 page, the rest from memory);
// QW-424.1 procedure base-metal rows (from memory). Each edge member is asked with its neighbours outside the group.
const range = (low: number, high: number) => Array.from({ length: high - low + 1 }, (_, i) => low + i)

describe('QW-423.1 welder base-metal groups', () => {
  const since2015: [string, string[]][] = [
    ['P-No. 1 through P-No. 15F, P-No. 34, P-No. 41 through P-No. 49', [...range(1, 14).map(String), '15A', '15E', '15F', '34', ...range(41, 49).map(String)]],
    ['P-No. 21 through P-No. 26', range(21, 26).map(String)],
    ['P-No. 51 through P-No. 53, P-No. 61, P-No. 62', ['51', '52', '53', '61', '62']],
  ]
  it('2023: each member of a row qualifies every member of it and nothing of the other rows', () => {
    for (const [label, members] of since2015) {
      for (const p of members) {
        const q = qw4231(p, '2023')
        expect([q.groups, q.clause, q.basis], p).toEqual([[label], 'QW-423.1', 'verified'])
        for (const [other, others] of since2015) for (const o of others) expect(q.contains(o), `${p} → ${o}`).toBe(other === label)
      }
    }
  })
  it('2023: the neighbours outside the rows are in none (15G, 16, 27, 50, 54, 63)', () => {
    expect(qw4231('1', '2023').contains('15G')).toBe(false)
    for (const p of ['16', '27', '33', '35', '40', '50', '54', '60', '63']) expect(() => qw4231(p, '2023'), p).toThrow('in no QW-423.1 row of the 2023 edition')
    expect(qw4231('1', '2023').contains('unassigned')).toBe(false)
  })
  it('2013 and earlier: 1–11, 34, 41–47; 21–25 (so 12, 48 and 26 are outside)', () => {
    expect(qw4231('11', '2013').groups).toEqual(['P-No. 1 through P-No. 11, P-No. 34, P-No. 41 through P-No. 47'])
    expect(qw4231('47', '2013').contains('34')).toBe(true)
    expect(qw4231('25', '2013').groups).toEqual(['P-No. 21 through P-No. 25'])
    for (const p of ['12', '48', '26']) expect(() => qw4231(p, '2013'), p).toThrow('in no QW-423.1 row of the 2013 edition')
    expect(qw4231('12', '2015').groups).toEqual([since2015[0]![0]]) // the 2015 rows apply from 2015
  })
  it('reads "P-No. 8", "p8" and " 8 " alike; unassigned metal qualifies only itself; rubbish is refused', () => {
    for (const text of ['P-No. 8', 'p8', 'P8', ' 8 ', 'P-NO.8']) expect(qw4231(text, '2023').groups, text).toEqual([since2015[0]![0]])
    expect(qw4231('unassigned', '2023')).toMatchObject({ groups: ['the same unassigned metal only'], basis: 'verified' })
    expect(qw4231('Unassigned', '2023').contains('1')).toBe(false)
    expect(() => qw4231('steel', '2023')).toThrow('pNumber: "steel" is not a P-Number')
  })
})

describe('QW-433 F-No. groups and QW-402.4 backing', () => {
  const groups2023: number[][] = [[1], [1, 2], [1, 2, 3], [1, 2, 3, 4], [5], [6], range(21, 26), [31], [32], [33], [35], [36], [37], [34, ...range(41, 46)], range(51, 55), [61], [71], [72]]
  const tested = (f: number) => (f <= 4 ? groups2023[f - 1]! : groups2023.find(g => g.includes(f))!)
  it('2023: each F-No. qualifies its group (F1–F4 themselves and every lower one)', () => {
    for (const f of [1, 2, 3, 4, 5, 6, 21, 26, 31, 32, 33, 34, 35, 36, 37, 41, 46, 51, 55, 61, 71, 72]) {
      expect(qw433(f, false, '2023').numbers, `F-No. ${f}`).toEqual(tested(f))
    }
  })
  it('2013 and earlier: F21–F25 and F34, F41–F45 (F26 and F46 not carried)', () => {
    expect(qw433(21, true, '2013').numbers).toEqual(range(21, 25))
    expect(qw433(34, true, '2013').numbers).toEqual([34, ...range(41, 45)])
    expect(() => qw433(26, true, '2013')).toThrow('fNumber: F-No. 26 is in no QW-433 group carried for the 2013 edition')
    expect(() => qw433(46, true, '2013')).toThrow('F-No. 46')
    expect(qw433(26, true, '2015').numbers).toEqual(range(21, 26))
  })
  it('numbers outside every group are refused (0, 7, 27, 38, 47, 50, 56, 62, 73)', () => {
    for (const f of [0, 7, 27, 38, 47, 50, 56, 62, 73]) expect(() => qw433(f, true, '2023'), `F-No. ${f}`).toThrow('in no QW-433 group')
  })
  it('a test without backing qualifies with and without; with backing, with backing only', () => {
    expect(qw433(4, false, '2023')).toEqual({ numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: true })
    expect(qw433(4, true, '2023')).toEqual({ numbers: [1, 2, 3, 4], withBacking: true, withoutBacking: false })
  })
})

describe('QW-424.1 base metals of one PQR for a WPS joint (from memory)', () => {
  const rows: [string, string, string, string, boolean][] = [
    ['1', '1', '1', '1', true], ['1', '1', '1', '3', false], ['8', '8', '8', '8', true],
    ['3', '3', '3', '1', true], ['3', '3', '1', '1', false], ['3', '3', '4', '3', false],
    ['4', '4', '4', '1', true], ['4', '4', '4', '3', true], ['4', '4', '3', '1', false], ['4', '4', '5A', '4', false],
    ['5A', '5A', '5A', '1', true], ['5A', '5A', '5A', '4', true], ['5A', '5A', '4', '4', false],
    ['5A', '4', '5A', '1', true], ['5A', '1', '3', '5A', true], ['5A', '1', '4', '1', false],
    ['4', '1', '3', '4', true], ['4', '3', '4', '4', false], ['3', '1', '3', '1', true], ['3', '1', '1', '1', false],
    ['15E', '15E', '5B', '15E', true], ['15E', '15E', '5B', '5B', true], ['15E', '15E', '5B', '1', false],
    ['1', '8', '8', '1', true], ['1', '8', '1', '1', false], ['unassigned', '1', '1', 'unassigned', true], ['unassigned', '1', 'unassigned', 'unassigned', false],
  ]
  it.each(rows)('PQR P-No. %s to %s, WPS %s to %s: %s', (pa, pb, wa, wb, expected) => {
    expect(qw4241(pa, pb, wa, wb)).toBe(expected)
  })
  it('normalises what people type, and refuses what is not a P-No.', () => {
    expect(['P-No. 5A', 'p5a', 'P5A', ' 5a '].map(pNo)).toEqual(['5A', '5A', '5A', '5A'])
    expect(pNo('unassigned')).toBe('UNASSIGNED')
    for (const bad of ['P-No.', '123', 'five', '5AA']) expect(() => pNo(bad), bad).toThrow(`pNumber: "${bad}" is not a P-No.`)
  })
})
