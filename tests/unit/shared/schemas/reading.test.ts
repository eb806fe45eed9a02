import { describe, expect, it } from 'vitest'
import { readingSchema } from '../../../../shared/schemas/reading'
import { baseMetalSchema, fillerMetalSchema } from '../../../../shared/schemas/catalogue'

describe('readingSchema: production readings', () => {
  it('needs at least one reading', () => {
    const empty = readingSchema.safeParse({})
    expect(empty.success).toBe(false)
    expect(empty.error?.issues[0]).toMatchObject({ path: ['volts'], message: 'Enter at least one reading' })
  })
  it('takes text boxes as numbers and a picked welder as an id', () => {
    const parsed = readingSchema.parse({ volts: '18.5', amps: '', welderId: '4' })
    expect(parsed).toMatchObject({ volts: 18.5, amps: null, welderId: 4 })
  })
  it('refuses negative readings and unknown fields', () => {
    expect(readingSchema.safeParse({ volts: -1 }).success).toBe(false)
    expect(readingSchema.safeParse({ volts: 18, amperes: 120 }).success).toBe(false)
  })
})

describe('catalogue schemas', () => {
  it('a base metal has a P-No. such as 1, 8 or 15E', () => {
    const ok = baseMetalSchema.safeParse({ specification: 'SA-516', grade: '70', pNumber: '1', groupNumber: '2', minTensilePsi: '70000' })
    expect(ok.success && ok.data).toMatchObject({ groupNumber: 2, minTensilePsi: 70000 })
    expect(baseMetalSchema.safeParse({ specification: 'SA-335', grade: 'P91', pNumber: '15E', groupNumber: 1, minTensilePsi: 85000 }).success).toBe(true)
    const bad = baseMetalSchema.safeParse({ specification: 'SA-516', grade: '70', pNumber: 'one', groupNumber: null, minTensilePsi: null })
    expect(bad.error?.issues[0]?.message).toBe('A P-No. such as 1, 8 or 15E')
  })
  it('a filler metal has an F-No.', () => {
    expect(fillerMetalSchema.safeParse({ specification: 'SFA-5.18', classification: 'ER70S-6', fNumber: '6', aNumber: '1' }).success).toBe(true)
    expect(fillerMetalSchema.safeParse({ specification: 'SFA-5.18', classification: 'ER70S-6', fNumber: '', aNumber: null }).success).toBe(false)
  })
})
