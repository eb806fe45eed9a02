import { describe, expect, it } from 'vitest'
import { beadHeatInput, beadVerdict } from '../../../../shared/trials/beads'
import { plotData, plotSvg } from '../../../../shared/trials/plot'
import { proposePqr, proposeWpsWindow, type JudgedBead, type PqrLimits } from '../../../../shared/trials/proposals'

// Invented beads for the tests (not the demo's). Heat inputs by QW-409.1(a), V × A × 60 / in/min, worked by hand.
const bead = (number: number, volts: number, wireFeed: number, amps: number | null, ok: boolean): JudgedBead => {
  const values = { volts, wireFeed, amps, ctwd: 0.375, travelSpeed: 15, beadLength: null, arcTime: null, gasFlow: null, energy: null, power: null }
  const judged = { wetting: 'good', spatter: ok ? 'good' : 'poor', arcSound: 'good', porosity: false, undercut: false, meltThrough: false, lackOfFusion: false, backPenetration: null } as const
  return { number, ...values, verdict: beadVerdict(judged).kind, heat: beadHeatInput(values, 'in') }
}
const series = { unit: 'in' as const, wireDiameter: 0.030, wireClass: 'ER70S-6', gas: '75Ar/25CO2', gasFlow: 25, thickness: 0.075, baseMetal: 'CS sheet', position: '1G' as const }
// A square of accepted settings around 17.5 V / 250 in/min, its middle bead, and a rejected bead outside.
const beads = [
  bead(1, 17, 220, 100, true), bead(2, 18, 220, 105, true), bead(3, 18, 280, 120, true), bead(4, 17, 280, 115, true),
  bead(5, 17.5, 250, 110, true), bead(6, 19.5, 330, 150, false),
]

describe('propose a PQR from accepted beads', () => {
  it('takes the accepted bead nearest the centre of the accepted region (bead 5 sits at the square\'s centroid, by hand)', () => {
    const p = proposePqr(series, beads)!
    expect(p.bead).toBe(5)
    expect(p.layer).toMatchObject({ volts: 17.5, wireFeed: 250, amps: 110, travelSpeed: 15 })
    // 17.5 × 110 × 60 / 15 = 7,700 J/in (QW-409.1(a), by hand)
    expect(p.layer.heatInput).toBe(7700)
    expect(p.values.find(v => v.field === 'volts')!.source).toContain('bead 5')
    expect(p.values.find(v => v.field === 'gas')!.source).toBe('the series header')
  })
  it('no accepted bead: no proposal', () => {
    expect(proposePqr(series, [beads[5]!])).toBeNull()
  })
})

const limits: PqrLimits = {
  number: 'T-PQR', thickness: { min: 0.0625, max: 0.0825 }, thicknessSource: 'QW-451.1 (test)', depositMax: null,
  heatInput: 7700, toughness: false, volts: 17.5, wireFeed: 250, ctwd: 0.375, travelSpeed: 15, amps: 110,
}

describe('propose the WPS window', () => {
  it('spans the accepted beads, holds the PQR value as set point, leaves the rejected bead out', () => {
    const w = proposeWpsWindow('in', beads, limits)!
    expect(w.volts).toEqual({ min: 17, max: 18, setPoint: 17.5 })
    expect(w.wireFeed).toEqual({ min: 220, max: 280, setPoint: 250 })
    expect(w.thickness).toEqual(limits.thickness)
    // highest accepted heat input: bead 3, 18 × 120 × 60 / 15 = 8,640 J/in (by hand)
    expect(w.heatInputMax).toBe(8640)
  })
  it('with toughness tests, beads above the PQR heat input are dropped and the PQR heat input is the limit (QW-409.1)', () => {
    const w = proposeWpsWindow('in', beads, { ...limits, toughness: true })!
    // bead 1: 17 × 100 × 60 / 15 = 6,800; bead 2: 7,560; bead 3: 8,640; bead 4: 7,820; bead 5: 7,700 J/in (by hand)
    expect(w.beads).toEqual([1, 2, 5])
    expect(w.dropped.map(d => d.bead)).toEqual([3, 4])
    expect(w.heatInputMax).toBe(7700)
    expect(w.wireFeed).toEqual({ min: 220, max: 250, setPoint: 250 })
  })
})

describe('plot data', () => {
  it('marks every bead by verdict and draws the hull of the accepted ones only', () => {
    const data = plotData(beads.map(b => ({ number: b.number, volts: b.volts, wireFeed: b.wireFeed, ctwd: b.ctwd, verdict: b.verdict })), 'wire-feed', 'in')
    expect(data.marks).toHaveLength(6)
    expect(data.region).toHaveLength(4)
    expect(data.region).not.toContainEqual({ x: 19.5, y: 330 })
    expect(data.x.min).toBeLessThanOrEqual(17)
    expect(data.x.max).toBeGreaterThanOrEqual(19.5)
    const svg = plotSvg(data)
    expect(svg).toContain('<polygon')
    expect(svg).toContain('accepted region')
    expect(svg).toContain('not judged')
  })
  it('beads at the same settings are all marked and numbered once together; no mark sits on the frame', () => {
    const data = plotData([
      { number: 1, volts: 17, wireFeed: 220, ctwd: 0.375, verdict: 'accepted' },
      { number: 8, volts: 17, wireFeed: 220, ctwd: 0.625, verdict: 'rejected' },
      { number: 2, volts: 18, wireFeed: 260, ctwd: 0.375, verdict: 'accepted' },
    ], 'wire-feed', 'in')
    const svg = plotSvg(data)
    expect(svg).toContain('>1, 8</text>')
    expect(svg.match(/<circle/g)).toHaveLength(3) // two accepted beads and the legend's circle
    expect(data.x.min).toBeLessThan(17)
    expect(data.x.max).toBeGreaterThan(18)
  })
  it('production readings are drawn as diamonds and never widen the accepted region', () => {
    const beadsOnly = plotData([{ number: 1, volts: 17, wireFeed: 220, ctwd: 0.375, verdict: 'accepted' }, { number: 2, volts: 18, wireFeed: 260, ctwd: 0.375, verdict: 'accepted' }, { number: 3, volts: 17, wireFeed: 260, ctwd: 0.375, verdict: 'accepted' }], 'wire-feed', 'in')
    const withReading = plotData([{ number: 1, volts: 17, wireFeed: 220, ctwd: 0.375, verdict: 'accepted' }, { number: 2, volts: 18, wireFeed: 260, ctwd: 0.375, verdict: 'accepted' }, { number: 3, volts: 17, wireFeed: 260, ctwd: 0.375, verdict: 'accepted' }], 'wire-feed', 'in', [{ volts: 19, wireFeed: 300, ctwd: null }])
    expect(withReading.region).toEqual(beadsOnly.region)
    expect(withReading.marks.at(-1)).toMatchObject({ verdict: 'reading', label: 'R' })
    expect(plotSvg(withReading)).toContain('>reading</text>')
    expect(plotData([], 'ctwd', 'in', [{ volts: 19, wireFeed: 300, ctwd: null }]).marks).toEqual([])
  })
  it('the CTWD view leaves out beads without CTWD and names them', () => {
    const data = plotData([{ number: 1, volts: 17, wireFeed: 200, ctwd: null, verdict: 'accepted' }, { number: 2, volts: 18, wireFeed: 220, ctwd: 0.5, verdict: 'rejected' }], 'ctwd', 'in')
    expect(data.leftOff).toEqual([1])
    expect(data.marks).toHaveLength(1)
    expect(data.y.label).toBe('CTWD, in')
  })
})
