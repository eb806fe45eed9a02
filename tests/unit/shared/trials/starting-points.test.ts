import { describe, expect, it } from 'vitest'
import { createRequire } from 'node:module'
import { farOutside, firstBeadFrom, nearestStartingPoint, type StartingRow } from '../../../../shared/trials/starting-points'
import { wireSize } from '../../../../shared/trials/words'

// Conversions cross-checked with convert-units, not with the code under test.
const convert = createRequire(import.meta.url)('convert-units') as (value: number) => { from: (unit: string) => { to: (unit: string) => number } }

// Invented rows for the test (not the demo's): only their relations matter.
const row = (id: number, over: Partial<StartingRow>): StartingRow => ({
  id, unit: 'in', process: 'GMAW', transfer: 'short-circuit', wireDiameter: 0.030, thickness: 0.060, gauge: null, gas: '75Ar/25CO2',
  volts: 17, wireFeed: 250, amps: null, ctwd: 0.375, travelSpeed: null, source: 'test row', ...over,
})
const series = { process: 'GMAW' as const, transfer: 'short-circuit' as const, wireDiameter: 0.030, thickness: 0.075, gas: '75Ar/25CO2', unit: 'in' as const }

describe('nearest starting row', () => {
  it('picks the same process and the nearest thickness and wire, and says what differs', () => {
    const rows = [row(1, { thickness: 0.120 }), row(2, { thickness: 0.075 }), row(3, { process: 'FCAW', transfer: null, thickness: 0.075 })]
    const near = nearestStartingPoint(series, rows)!
    expect(near.row.id).toBe(2)
    expect(near.notes).toEqual([])
  })
  it('a different gas weighs less than the wrong wire; the notes name the gas', () => {
    const rows = [row(1, { gas: '100CO2' }), row(2, { wireDiameter: 0.045 })]
    const near = nearestStartingPoint({ ...series, thickness: 0.060 }, rows)!
    expect(near.row.id).toBe(1)
    expect(near.notes.join(' ')).toContain('gas')
  })
  it('a millimetre row is compared in inches: 0.8 mm wire is 0.0315 in (cross-checked with convert-units)', () => {
    const rows = [row(1, { unit: 'mm', wireDiameter: 0.8, thickness: convert(0.075).from('in').to('mm'), wireFeed: 6350, ctwd: 10 }), row(2, { wireDiameter: 0.045 })]
    expect(nearestStartingPoint(series, rows)!.row.id).toBe(1)
    expect(firstBeadFrom(rows[0]!, 'in').wireFeed).toBeCloseTo(convert(6350).from('mm').to('in'), 2)
  })
  it('no row for the process gives none', () => {
    expect(nearestStartingPoint({ ...series, process: 'GTAW', transfer: null }, [row(1, {})])).toBeNull()
  })
})

describe('far outside', () => {
  it('1 A per 0.001 in (common practice): 0.075 in expects about 75 A; 200 A is flagged, 90 A is not', () => {
    expect(farOutside({ volts: 17, wireFeed: 250, amps: 200 }, series, null)).toEqual([expect.objectContaining({ field: 'amps', basis: 'common practice' })])
    expect(farOutside({ volts: 17, wireFeed: 250, amps: 90 }, series, null)).toEqual([])
  })
  it('the rule of thumb is for short-circuit GMAW only (common practice)', () => {
    expect(farOutside({ volts: 24, wireFeed: 400, amps: 250 }, { ...series, transfer: 'spray' }, null)).toEqual([])
  })
  it('more than 2 V or 40 % wire feed from the starting row is flagged (Rootface threshold)', () => {
    const start = row(1, {})
    expect(farOutside({ volts: 19.5, wireFeed: 250, amps: null }, series, start).map(f => f.field)).toEqual(['volts'])
    expect(farOutside({ volts: 17, wireFeed: 400, amps: null }, series, start).map(f => f.field)).toEqual(['wireFeed'])
    expect(farOutside({ volts: 18.9, wireFeed: 340, amps: null }, series, start)).toEqual([])
  })
})

describe('wire size words', () => {
  it('an inch wire with three decimals as the trade writes it (0.030 in, common practice); a millimetre wire as given', () => {
    expect(wireSize(0.03, 'in')).toBe('0.030 in')
    expect(wireSize(0.8, 'mm')).toBe('0.8 mm')
  })
})
