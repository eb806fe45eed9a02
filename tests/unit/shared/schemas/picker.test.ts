import { describe, expect, it } from 'vitest'
import { pqrPickerSchema, welderPickerSchema } from '../../../../shared/schemas/picker'

// The pickers' query (common practice for search-as-you-type: a short text, a bounded page, ids of chosen records).
describe('picker queries', () => {
  it('defaults to active welders, the first 20 matches', () => {
    expect(welderPickerSchema.parse({})).toEqual({ q: '', limit: 20, status: 'active' })
  })

  it('reads ids as a de-duplicated list of at most 50', () => {
    expect(welderPickerSchema.parse({ ids: '3,1,3' }).ids).toEqual([3, 1])
    expect(welderPickerSchema.parse({ ids: Array.from({ length: 60 }, (_, i) => i + 1).join(',') }).ids).toHaveLength(50)
    expect(welderPickerSchema.parse({ ids: '' }).ids).toEqual([])
  })

  it('refuses what is not a search', () => {
    for (const bad of [{ ids: '1,,2' }, { ids: 'a' }, { q: 'x'.repeat(81) }, { limit: '0' }, { limit: '51' }, { status: 'gone' }]) {
      expect(welderPickerSchema.safeParse(bad).success, JSON.stringify(bad)).toBe(false)
    }
    expect(pqrPickerSchema.safeParse({ status: 'approved' }).success).toBe(false) // a PQR is recorded, certified or failed
  })
})
