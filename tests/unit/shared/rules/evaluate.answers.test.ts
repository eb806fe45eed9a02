import { describe, expect, it } from 'vitest'
import { cautionText, evaluate, evaluateAll } from '../../../../shared/rules/index'
import { pqrLayers, productionLayers, productionPositions, testLayers, wpsLayers } from '../../../../shared/rules/layers'
import { refused } from './helpers'

// The envelope of every rule answer and its refusals, word for word (Rootface's own messages; the editions carried are
// the ones docs/sources.md names for each code).
const gauge = { gauge: 14, material: 'steel' }

describe('evaluate(): refusals with their whole message', () => {
  it('an edition not carried lists those carried', () => {
    expect(refused({ code: 'aws-d1.3', edition: '2001', check: 'gauge', unit: 'in', input: gauge })).toBe('edition: AWS D1.3 editions carried are 2008, 2018; got "2001"')
  })
  it('a unit the code does not print is refused, except for continuity (dates only)', () => {
    expect(refused({ code: 'iso-9606-1', check: 'gauge', unit: 'in', input: gauge })).toBe('unit: ISO 9606-1 prints its ranges in mm; send "unit": "mm"')
    const c = evaluate({ code: 'iso-9606-1', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-02-01' } })
    expect(c).not.toHaveProperty('error')
    expect(c).toMatchObject({ code: 'iso-9606-1', edition: '2012', unit: 'in' })
  })
  it('a check a code has no rules for names the code and the check', () => {
    expect(refused({ code: 'aws-d1.3', check: 'bend', unit: 'in', input: { specimens: [{ type: 'face', indications: [] }] } })).toBe('bend: AWS D1.3 has no bend rules in this program')
  })
  it('unknown fields: one named singular, several plural', () => {
    expect(refused({ code: 'asme-ix', check: 'gauge', unit: 'in', input: { ...gauge, a: 1 } })).toBe('input: unknown field a')
    expect(refused({ code: 'asme-ix', check: 'gauge', unit: 'in', input: { ...gauge, a: 1, b: 2 } })).toBe('input: unknown fields a, b')
  })
  it('a result carries its fields, reasons, code, edition, unit and the caution of that code and edition', () => {
    const r = evaluate({ code: 'aws-d1.3', edition: '2008', check: 'gauge', unit: 'in', input: gauge }) as Record<string, unknown>
    expect(r).toMatchObject({ code: 'aws-d1.3', edition: '2008', unit: 'in', caution: cautionText('aws-d1.3', '2008') })
    expect(Object.keys(r).slice(-5)).toEqual(['reasons', 'code', 'edition', 'unit', 'caution'])
  })
  it('evaluateAll keeps the order of a list and answers one request as one', () => {
    const list = evaluateAll([{ code: 'asme-ix', check: 'gauge', unit: 'in', input: gauge }, { code: 'nope' }]) as Record<string, unknown>[]
    expect(list).toHaveLength(2)
    expect(list[0]).toMatchObject({ code: 'asme-ix' })
    expect(list[1]).toHaveProperty('error')
    expect(Array.isArray(evaluateAll({ code: 'asme-ix', check: 'gauge', unit: 'in', input: gauge }))).toBe(false)
  })
})

describe('layers: the process layers of a record, and the refusals when none is named', () => {
  it('a single-process test is one layer without the fields it does not state', () => {
    expect(testLayers({ process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], fNumber: 4 })).toEqual([{ process: 'SMAW', fNumber: 4 }])
    expect(() => testLayers({ form: 'plate', weld: 'groove', testPositions: ['1G'] })).toThrow('process: give the process (or processes) of the test')
    expect(testLayers({ processes: [], process: 'GTAW', form: 'plate', weld: 'groove', testPositions: ['1G'] })).toEqual([{ process: 'GTAW' }])
  })
  it('production: positions before position; no position refused; its thickness is the deposit of its one layer', () => {
    expect(productionPositions({ form: 'plate', weld: 'groove', positions: ['F', 'V'], position: 'H' })).toEqual(['F', 'V'])
    expect(productionPositions({ form: 'plate', weld: 'groove', positions: [], position: 'H' })).toEqual(['H'])
    expect(() => productionPositions({ form: 'plate', weld: 'groove' })).toThrow('production.position: give the production position (or positions)')
    expect(productionLayers({ form: 'plate', weld: 'groove', process: 'SMAW', thickness: 0.5 })).toEqual([{ process: 'SMAW', depositThickness: 0.5 }])
    expect(productionLayers({ form: 'plate', weld: 'groove', processes: [], thickness: 0.5 })).toEqual([])
  })
  it('a WPS or a PQR without a process is refused with its own message', () => {
    expect(() => wpsLayers({ layers: [] } as never)).toThrow('wps.process: give the process (or layers) of the WPS')
    expect(wpsLayers({ process: 'SMAW', fNumber: 4 } as never)).toEqual([{ process: 'SMAW', fNumber: 4 }])
    expect(() => pqrLayers({ layers: [] } as never)).toThrow('pqrs: each PQR needs its process (or layers)')
    expect(pqrLayers({ process: 'GTAW', heatInput: 30000 } as never)).toEqual([{ process: 'GTAW', heatInput: 30000 }])
  })
})
