import { describe, expect, it } from 'vitest'
import { welderTestSchema } from '../../../../shared/schemas/welder-test'
import { qualifiedRangesOf } from '../../../../shared/qualification/test-ranges'

const sheet = (extra: Record<string, unknown> = {}) => ({
  welderId: 1, testDate: '2026-11-25', code: 'aws-d1.3', edition: '2018', unit: 'in', processes: [{ process: 'GMAW', transfer: 'short-circuit' }],
  form: 'plate', weld: 'groove', jointType: 'square-groove', couponThickness: 0.0747, backing: false, positions: ['1G'], examination: 'macro-fracture', ...extra,
})
const fieldsOf = (input: unknown) => {
  const r = welderTestSchema.safeParse(input)
  return r.success ? {} : r.error.flatten().fieldErrors
}

describe('AWS D1.3 welder test record', () => {
  it('a groove test needs a square or flare groove joint (D1.3 4.7, sources B: joint type is an essential variable)', () => {
    expect(fieldsOf(sheet({ jointType: null }))).toHaveProperty('jointType')
    expect(fieldsOf(sheet({ jointType: 'fillet' }))).toHaveProperty('jointType')
    expect(fieldsOf(sheet())).toEqual({})
  })
  it('sheet over 3/16 in (4.8 mm) is sent to D1.1 (D1.3 scope, sources B: 3/16 in or less)', () => {
    expect(fieldsOf(sheet({ couponThickness: 0.1875 }))).toEqual({})
    expect(fieldsOf(sheet({ couponThickness: 0.19 })).couponThickness?.[0]).toContain('AWS D1.1')
    expect(fieldsOf(sheet({ unit: 'mm', couponThickness: 4.9 })).couponThickness?.[0]).toContain('AWS D1.1')
  })
  it('a joint type on another code is refused', () => {
    expect(fieldsOf(sheet({ code: 'aws-d1.1', edition: '2020', couponThickness: 0.375 }))).toHaveProperty('jointType')
  })
  it('the joint type reaches the rules: a 14 ga square-groove test qualifies 0.5t to 2t (D1.3 4.7.2, read; 14 ga = 0.0747 in, sources D)', () => {
    const r = qualifiedRangesOf({ code: 'aws-d1.3', edition: '2018', unit: 'in', process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', couponThickness: 0.0747, positions: ['1G'], jointType: 'square-groove' })
    expect((r as unknown as { thickness: unknown }).thickness).toEqual({ min: 0.03735, max: 0.1494 })
  })
})
