import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

// ISO 9606-1, clause 7 bend acceptance as remembered (from memory): no single imperfection over 3 mm; corners disregarded.
const bend = (specimens: unknown[]) => ok({ code: 'iso-9606-1', check: 'bend', unit: 'mm', input: { specimens } })

describe('ISO 9606-1 bend acceptance (clause 7, from memory)', () => {
  it('3 mm passes, 3.1 mm fails (limit 3 mm, from memory)', () => {
    expect(bend([{ type: 'root', indications: [{ size: 3 }] }]).accepted).toBe(true)
    expect(bend([{ type: 'root', indications: [{ size: 3.1 }] }]).accepted).toBe(false)
  })
  it('a corner imperfection not from the weld is disregarded (from memory)', () => {
    expect(bend([{ type: 'face', indications: [{ size: 5, atCorner: true }] }]).accepted).toBe(true)
  })
  it('says the ISO 5817 levels are checked by hand (house rule: never a false yes)', () => {
    expect(JSON.stringify(bend([{ type: 'face', indications: [] }]).reasons)).toContain('check by hand')
  })
})
