import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { createRequire } from 'node:module'
import { beadHeatInput, beadTravelSpeed, beadVerdict } from '../../../../shared/trials/beads'

// Conversions cross-checked with convert-units, not with the code under test.
const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }

const none = { amps: null, travelSpeed: null, beadLength: null, arcTime: null, energy: null, power: null }
const judged = { wetting: null, spatter: null, arcSound: null, porosity: false, undercut: false, meltThrough: false, lackOfFusion: false, backPenetration: null } as const

describe('heat input per bead, ASME IX QW-409.1 (2023)', () => {
  it('(a) with travel speed: 18 V × 120 A × 60 / 15 in/min = 8,640 J/in (formula of QW-409.1(a), worked by hand)', () => {
    const r = beadHeatInput({ ...none, volts: 18, amps: 120, travelSpeed: 15 }, 'in')
    expect(r).toMatchObject({ kind: 'value', heatInput: 8640, perUnit: 'J/in', method: 'volts-amps' })
    if (r.kind === 'value') expect(r.reasons[0]!.clause).toBe('QW-409.1(a)')
  })
  it('(a) with the travel speed from bead length and arc time: 6 in in 24 s is 15 in/min (by hand)', () => {
    expect(beadTravelSpeed({ travelSpeed: null, beadLength: 6, arcTime: 24 })).toBe(15)
    expect(beadHeatInput({ ...none, volts: 18, amps: 120, beadLength: 6, arcTime: 24 }, 'in')).toMatchObject({ heatInput: 8640 })
  })
  it('the same bead in mm: 152.4 mm in 24 s; J/mm is J/in ÷ 25.4 (cross-checked with convert-units)', () => {
    const mm = convert(6).from('in').to('mm')
    const r = beadHeatInput({ ...none, volts: 18, amps: 120, beadLength: mm, arcTime: 24 }, 'mm')
    expect(r.kind === 'value' && r.heatInput).toBeCloseTo(8640 / convert(1).from('in').to('mm'), 0)
  })
  it('(c) with the energy read from the power source: 51,840 J over 6 in = 8,640 J/in (QW-409.1(c))', () => {
    const r = beadHeatInput({ ...none, volts: 18, energy: 51840, beadLength: 6 }, 'in')
    expect(r).toMatchObject({ kind: 'value', heatInput: 8640, method: 'energy' })
    if (r.kind === 'value') expect(r.reasons[0]!.clause).toBe('QW-409.1(c)')
  })
  it('(c) with power: 2,160 W × 24 s / 6 in = 8,640 J/in (QW-409.1(c))', () => {
    expect(beadHeatInput({ ...none, volts: 18, power: 2160, arcTime: 24, beadLength: 6 }, 'in')).toMatchObject({ heatInput: 8640, method: 'power' })
  })
  it('without amps, or without a speed, it cannot tell and says what to record (never a guess)', () => {
    expect(beadHeatInput({ ...none, volts: 18, travelSpeed: 15 }, 'in')).toMatchObject({ kind: 'cannot-tell', because: expect.stringContaining('amps') })
    expect(beadHeatInput({ ...none, volts: 18, amps: 120 }, 'in')).toMatchObject({ kind: 'cannot-tell', because: expect.stringContaining('travel speed') })
  })
})

describe('bead verdict (Rootface rule for trials)', () => {
  it('a bead with nothing judged is not judged, never accepted', () => {
    expect(beadVerdict(judged).kind).toBe('not-judged')
  })
  it('good and fair scales with no discontinuity ticked are accepted', () => {
    expect(beadVerdict({ ...judged, wetting: 'good', spatter: 'fair', arcSound: 'good' }).kind).toBe('accepted')
  })
  it('porosity or a poor scale rejects, naming why', () => {
    expect(beadVerdict({ ...judged, wetting: 'good', porosity: true })).toEqual({ kind: 'rejected', because: ['porosity'] })
    expect(beadVerdict({ ...judged, wetting: 'good', spatter: 'poor' })).toEqual({ kind: 'rejected', because: ['spatter poor'] })
  })
  it('a ticked discontinuity or a poor scale never leaves "accepted" (property; Rootface rule for trials)', () => {
    const scale = fc.constantFrom('good', 'fair', 'poor', null)
    const bead = fc.record({ wetting: scale, spatter: scale, arcSound: scale, porosity: fc.boolean(), undercut: fc.boolean(), meltThrough: fc.boolean(), lackOfFusion: fc.boolean(), backPenetration: fc.constantFrom('full', 'partial', 'none', null) })
    const flaw = fc.constantFrom('porosity', 'undercut', 'meltThrough', 'lackOfFusion', 'wetting', 'spatter', 'arcSound')
    fc.assert(fc.property(bead, flaw, fc.boolean(), (b, f, back) => {
      const spoiled = { ...b, [f]: f === 'wetting' || f === 'spatter' || f === 'arcSound' ? 'poor' : true }
      expect(beadVerdict(spoiled as Parameters<typeof beadVerdict>[0], back).kind).toBe('rejected')
    }))
  })
  it('where full back penetration is needed, partial rejects and unrecorded is not judged', () => {
    expect(beadVerdict({ ...judged, wetting: 'good', backPenetration: 'partial' }, true).kind).toBe('rejected')
    expect(beadVerdict({ ...judged, wetting: 'good' }, true).kind).toBe('not-judged')
  })
})
