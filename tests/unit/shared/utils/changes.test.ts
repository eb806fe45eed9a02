import { describe, expect, it } from 'vitest'
import { changedFields, changeLines } from '../../../../shared/utils/changes'

describe('audit history: changed fields', () => {
  it('lists fields that differ, ignoring bookkeeping', () => {
    expect(changedFields({ name: 'A', stamp: 'K1', version: 1 }, { name: 'B', stamp: 'K1', version: 2, email: 'x@y.test' })).toEqual([
      { field: 'email', from: undefined, to: 'x@y.test' },
      { field: 'name', from: 'A', to: 'B' },
    ])
  })
  it('treats a creation (no before) as every field new, and nested values by content', () => {
    expect(changedFields(null, { a: [1, 2] })).toEqual([{ field: 'a', from: undefined, to: [1, 2] }])
    expect(changedFields({ a: { b: 1 } }, { a: { b: 1 } })).toEqual([])
  })
})

describe('audit history: labelled lines, never raw JSON', () => {
  it('names fields in words and nested values by their path', () => {
    const lines = changeLines(
      { weldedOn: '2026-01-02', layers: [{ amps: { min: 90, max: 130 } }], pNumber: '1' },
      { weldedOn: '2026-01-03', layers: [{ amps: { min: 90, max: 140 } }], pNumber: '1' },
    )
    expect(lines).toEqual([
      { label: 'Layers › 1 › amps › to', from: '130', to: '140' },
      { label: 'Welded on', from: '2026-01-02', to: '2026-01-03' },
    ])
    expect(lines.some(l => /[{}"]/.test(l.from + l.to))).toBe(false)
  })
  it('a new record shows every value against a dash; lists and yes/no read as words', () => {
    expect(changeLines(null, { positions: ['3G', '4G'], backing: true })).toEqual([
      { label: 'Backing', from: '—', to: 'yes' },
      { label: 'Positions', from: '—', to: '3G, 4G' },
    ])
  })
})
