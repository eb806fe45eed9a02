import { describe, expect, it } from 'vitest'
import { changedFields } from '../../../../shared/utils/changes'

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
