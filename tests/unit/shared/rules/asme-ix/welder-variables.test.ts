import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { asmeWelderVariables } from '../../../../../shared/rules/asme-ix/variables'
import { ok } from '../helpers'

type Obj = Record<string, unknown>
const covers = (test: unknown, production: Obj, edition = '2023') =>
  ok({ code: 'asme-ix', check: 'covers', unit: 'in', edition, input: { test, production } }) as unknown as { covered: boolean, answer: string, record: string[], reasons: { variable?: string, state?: string, clause: string }[] }

// A GTAW 6G pipe coupon with every QW-356 variable recorded (values invented; each expectation names its clause).
const gtaw = {
  process: 'GTAW', form: 'pipe', weld: 'groove', testPositions: ['6G'], couponThickness: 0.28, depositThickness: 0.28, outsideDiameter: 6.625,
  backing: false, pNumber: '1', fNumber: 6, progression: 'uphill', fillerAdded: true, consumableInsert: false, fillerForm: 'solid', backingGas: true, current: 'DCEN',
}
const gtawJoint = {
  code: 'asme-ix', form: 'pipe', weld: 'groove', positions: ['F', 'V', 'O'], outsideDiameter: 4.5, thickness: 0.5, process: 'GTAW',
  backing: false, pNumber: '8', fNumber: 6, progression: 'uphill', fillerAdded: true, consumableInsert: false, fillerForm: 'metal-cored', backingGas: true, current: 'DCEN',
}

describe('ASME IX welder variables of QW-350, each compared when both sides state it', () => {
  it('the fully recorded GTAW coupon covers the joint (QW-356 rows from memory; QW-452.1(b) 2t, QW-452.3, QW-461.9 6G, QW-423.1 read)', () => {
    const r = covers(gtaw, gtawJoint)
    expect([r.answer, r.covered]).toEqual(['covered', true])
  })
  it.each([
    ['code', { code: 'aws-d1.1' }, 'not-covered'], // convention: a D1.1 joint is not an ASME joint
    ['process', { process: 'SMAW' }, 'not-covered'], // QW-350: each process its own test
    ['progression', { progression: 'downhill' }, 'not-covered'], // QW-405.3, from memory
    ['filler-added', { fillerAdded: false }, 'not-covered'], // QW-404.14, from memory
    ['consumable-insert', { consumableInsert: true }, 'not-covered'], // QW-404.22, from memory
    ['filler-form', { fillerForm: 'flux-cored' }, 'not-covered'], // QW-404.23, from memory
    ['backing-gas', { backingGas: false }, 'not-covered'], // QW-408.8, from memory
    ['current', { current: 'AC' }, 'not-covered'], // QW-409.4, from memory
    ['f-number', { fNumber: 5 }, 'not-covered'], // QW-433 (F6 only itself), from memory
    ['p-number', { pNumber: '51' }, 'not-covered'], // QW-423.1 2023 rows, read
    ['deposit', { thickness: 0.57 }, 'not-covered'], // QW-452.1(b): 2t = 0.56 in, read
    ['diameter', { outsideDiameter: 2.375 }, 'not-covered'], // QW-452.3: a 6.625 in coupon qualifies 2-7/8 in and over, read
  ])('%s: changing it to an unqualified value gives not covered', (variable, change, answer) => {
    const r = covers(gtaw, { ...gtawJoint, ...change })
    expect(r.answer).toBe(answer)
    expect(r.reasons).toContainEqual(expect.objectContaining({ variable, state: 'not-met' }))
  })
  it('production states a variable the test did not record: cannot tell, record it (QW-405.3, QW-409.4)', () => {
    const { progression: _p, current: _c, ...unrecorded } = gtaw
    const r = covers(unrecorded, gtawJoint)
    expect(r.answer).toBe('cannot-tell')
    expect(r.record).toEqual(expect.arrayContaining(['test.progression', 'test.current']))
    expect(r.covered).toBe(false)
  })
  it('the test states a restricting value production leaves out: cannot tell for the new variables (QW-409.2)', () => {
    const spray = { process: 'GMAW', transfer: 'spray', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 1 }
    const r = covers(spray, { form: 'plate', weld: 'groove', position: 'F', process: 'GMAW', thickness: 0.5 })
    expect([r.answer, r.record]).toEqual(['cannot-tell', ['production.transfer']])
  })
  it('GMAW spray and short-circuit qualify each other not (QW-409.2, from memory; the issue\'s first wrong yes)', () => {
    const spray = { process: 'GMAW', transfer: 'spray', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 1 }
    expect(covers(spray, { form: 'plate', weld: 'groove', position: 'F', process: 'GMAW', transfer: 'short-circuit', thickness: 0.5 }).answer).toBe('not-covered')
    expect(covers(spray, { form: 'plate', weld: 'groove', position: 'F', process: 'GMAW', transfer: 'pulse', thickness: 0.5 }).answer).toBe('covered')
  })
  it('several positions: a 5G-type fixed joint welded F, V and O needs each (QW-461.9, read: 3G qualifies F, V on plate)', () => {
    const g3 = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1, progression: 'uphill' }
    expect(covers(g3, { form: 'plate', weld: 'groove', positions: ['F', 'V'], process: 'SMAW', progression: 'uphill', thickness: 1 }).answer).toBe('covered')
    expect(covers(g3, { form: 'plate', weld: 'groove', positions: ['F', 'V', 'O'], process: 'SMAW', progression: 'uphill', thickness: 1 }).answer).toBe('not-covered')
  })
  it('backing: a test with backing does not cover an open-root groove; a test without covers both (QW-402.4, from memory)', () => {
    const withBacking = { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.5, backing: true }
    expect(covers(withBacking, { form: 'plate', weld: 'groove', position: 'F', process: 'SMAW', backing: false, thickness: 0.5 }).answer).toBe('not-covered')
    expect(covers({ ...withBacking, backing: false }, { form: 'plate', weld: 'groove', position: 'F', process: 'SMAW', backing: true, thickness: 0.5 }).answer).toBe('covered')
  })
  it('combination coupon GTAW root + SMAW fill: each process within its own deposit, SMAW counted as welded on backing (QW-452.1(b) Note 1, QW-306, QW-402.4: from memory)', () => {
    const combo = { form: 'pipe', weld: 'groove', testPositions: ['6G'], outsideDiameter: 6.625, backing: false, couponThickness: 0.432,
      processes: [{ process: 'GTAW', depositThickness: 0.125, progression: 'uphill' }, { process: 'SMAW', depositThickness: 0.307, fNumber: 4, progression: 'uphill' }] }
    const joint = { form: 'pipe', weld: 'groove', positions: ['F'], outsideDiameter: 8.625, backing: false }
    expect(covers(combo, { ...joint, backing: true, process: 'SMAW', fNumber: 4, thickness: 0.6 }).answer).toBe('covered') // 2 × 0.307 = 0.614 in
    expect(covers(combo, { ...joint, backing: true, process: 'SMAW', fNumber: 4, thickness: 0.62 }).answer).toBe('not-covered')
    // Its SMAW was welded on the GTAW root: it does not qualify SMAW in an open root.
    expect(covers(combo, { ...joint, process: 'SMAW', fNumber: 4, thickness: 0.3 }).reasons).toContainEqual(expect.objectContaining({ variable: 'backing', state: 'not-met' }))
    expect(covers(combo, { ...joint, process: 'GTAW', thickness: 0.3 }).answer).toBe('not-covered') // 2 × 0.125 = 0.25 in
    expect(covers(combo, { ...joint, processes: [{ process: 'GTAW', depositThickness: 0.25 }, { process: 'SMAW', depositThickness: 0.5, fNumber: 4 }] }).answer).toBe('covered')
  })
  it('the table names every QW-350 variable it compares, each with a clause', () => {
    expect(asmeWelderVariables.map(v => v.id)).toEqual(expect.arrayContaining(['transfer', 'progression', 'backing', 'f-number', 'filler-added', 'consumable-insert', 'filler-form', 'backing-gas', 'current', 'code', 'position', 'diameter', 'p-number', 'deposit']))
    for (const v of asmeWelderVariables) expect(v.clause).toMatch(/^QW-/)
  })
})

// Metamorphic property over the variable table: from a covered pair, change ONE essential variable of production
// to a value the test does not qualify; the answer must leave "covered" (become not covered or cannot tell).
describe('ASME IX covers: changing one essential variable to an unqualified value never stays "covered" (fast-check)', () => {
  const process = fc.constantFrom('SMAW', 'GMAW', 'GTAW')
  const pair = fc.record({
    process,
    t: fc.integer({ min: 8, max: 31 }).map(n => n / 64), // under 1/2 in: QW-452.1(b) 2t (GMAW-S 1.1t)
    shortCircuit: fc.boolean(),
    openRoot: fc.boolean(),
    positions: fc.subarray(['F', 'H', 'V', 'O'], { minLength: 1 }),
    current: fc.constantFrom('AC', 'DCEP', 'DCEN'),
    uphill: fc.boolean(),
  }).map(({ process, t, shortCircuit, openRoot, positions, current, uphill }) => {
    const gmaw = process === 'GMAW'
    const gtaw = process === 'GTAW'
    const fNumber = process === 'SMAW' ? 4 : 6
    const progression = uphill ? 'uphill' : 'downhill'
    const test: Obj = {
      process, form: 'pipe', weld: 'groove', testPositions: ['6G'], depositThickness: t, couponThickness: t, outsideDiameter: 6.625,
      backing: !openRoot, pNumber: '1', fNumber, progression,
      ...(gmaw ? { transfer: shortCircuit ? 'short-circuit' : 'spray', backingGas: openRoot } : {}),
      ...(gtaw ? { fillerAdded: true, consumableInsert: false, fillerForm: 'solid', backingGas: openRoot, current } : {}),
    }
    const production: Obj = {
      code: 'asme-ix', process, form: 'pipe', weld: 'groove', positions, outsideDiameter: 8.625, thickness: t, backing: !openRoot, pNumber: '1', fNumber, progression,
      ...(gmaw ? { transfer: test.transfer, backingGas: openRoot } : {}),
      ...(gtaw ? { fillerAdded: true, consumableInsert: false, fillerForm: 'solid', backingGas: openRoot, current } : {}),
    }
    return { test, production }
  })
  type Mutation = { id: string, applies: (t: Obj, p: Obj) => boolean, change: (t: Obj, p: Obj) => Obj }
  const mutations: Mutation[] = [
    { id: 'code', applies: () => true, change: () => ({ code: 'iso-9606-1' }) },
    { id: 'process', applies: () => true, change: t => ({ process: t.process === 'SMAW' ? 'GTAW' : 'SMAW', fNumber: t.process === 'SMAW' ? 6 : 4 }) },
    { id: 'transfer', applies: t => t.process === 'GMAW', change: t => ({ transfer: t.transfer === 'short-circuit' ? 'globular' : 'short-circuit' }) },
    { id: 'progression', applies: (_t, p) => (p.positions as string[]).includes('V'), change: (_t, p) => ({ progression: p.progression === 'uphill' ? 'downhill' : 'uphill' }) },
    { id: 'backing', applies: t => t.backing === true, change: () => ({ backing: false }) },
    { id: 'f-number', applies: () => true, change: t => ({ fNumber: t.fNumber === 4 ? 5 : 5 }) },
    { id: 'p-number', applies: () => true, change: () => ({ pNumber: '51' }) },
    { id: 'deposit', applies: () => true, change: t => ({ thickness: (t.depositThickness as number) * 2 + 1 / 64 }) },
    { id: 'diameter', applies: () => true, change: () => ({ outsideDiameter: 2.375 }) },
    { id: 'filler-added', applies: t => t.process === 'GTAW', change: () => ({ fillerAdded: false }) },
    { id: 'consumable-insert', applies: t => t.process === 'GTAW' && t.backing === false, change: () => ({ consumableInsert: true }) },
    { id: 'filler-form', applies: t => t.process === 'GTAW', change: () => ({ fillerForm: 'powder' }) },
    { id: 'backing-gas', applies: t => t.backingGas === true && t.backing === false, change: () => ({ backingGas: false }) },
    { id: 'current', applies: t => t.process === 'GTAW', change: t => ({ current: t.current === 'AC' ? 'DCEN' : 'AC' }) },
  ]
  it('holds for every applicable variable of QW-353, QW-355 and QW-356', () => {
    fc.assert(fc.property(pair, fc.nat(), ({ test, production }, pick) => {
      expect(covers(test, production).answer).toBe('covered')
      const applicable = mutations.filter(m => m.applies(test, production))
      const m = applicable[pick % applicable.length]!
      const changed = covers(test, { ...production, ...m.change(test, production) })
      expect(changed.covered, m.id).toBe(false)
      expect(['not-covered', 'cannot-tell']).toContain(changed.answer)
    }), { numRuns: 300 })
  })
  it('and dropping one recorded variable from the test never stays "covered" either', () => {
    const dropped = ['transfer', 'progression', 'fNumber', 'pNumber', 'current', 'fillerForm', 'fillerAdded', 'outsideDiameter']
    fc.assert(fc.property(pair, fc.constantFrom(...dropped), ({ test, production }, field) => {
      fc.pre(test[field] !== undefined && (field !== 'progression' || (production.positions as string[]).includes('V')))
      const { [field]: _gone, ...rest } = test
      expect(covers(rest, production).covered).toBe(false)
    }), { numRuns: 200 })
  })
})
