import type { Reason, RuleContext } from './types'
import { refuse } from './refusal'
import { fromMicro, scale, toMicro } from './units'

/**
 * Manufacturers' Standard Gauge for sheet steel (uncoated carbon steel sheet): a weight-based
 * gauge, 41.82 lb/ft² per inch of thickness. Decimal inches as published in the gauge charts
 * (SOURCES.md D); gauges 15, 17, 19, 21 and 23 are from memory (the charts show them rounded).
 * Galvanized, stainless and aluminium sheet use other tables, so other materials are refused.
 */
const steelGauge: ReadonlyMap<number, { inch: number, fromMemory: boolean }> = new Map([
  [7, { inch: 0.1793, fromMemory: false }],
  [8, { inch: 0.1644, fromMemory: false }],
  [9, { inch: 0.1495, fromMemory: false }],
  [10, { inch: 0.1345, fromMemory: false }],
  [11, { inch: 0.1196, fromMemory: false }],
  [12, { inch: 0.1046, fromMemory: false }],
  [13, { inch: 0.0897, fromMemory: false }],
  [14, { inch: 0.0747, fromMemory: false }],
  [15, { inch: 0.0673, fromMemory: true }],
  [16, { inch: 0.0598, fromMemory: false }],
  [17, { inch: 0.0538, fromMemory: true }],
  [18, { inch: 0.0478, fromMemory: false }],
  [19, { inch: 0.0418, fromMemory: true }],
  [20, { inch: 0.0359, fromMemory: false }],
  [21, { inch: 0.0329, fromMemory: true }],
  [22, { inch: 0.0299, fromMemory: false }],
  [23, { inch: 0.0269, fromMemory: true }],
  [24, { inch: 0.0239, fromMemory: false }],
  [26, { inch: 0.0179, fromMemory: false }],
  [28, { inch: 0.0149, fromMemory: false }],
  [30, { inch: 0.0120, fromMemory: false }],
])

export const steelGauges: readonly number[] = [...steelGauge.keys()]

export interface GaugeInput {
  gauge: number
  material: string
}

export interface GaugeResult {
  thickness: number
  gauge: number
  material: 'steel'
  reasons: Reason[]
}

export function gaugeThickness(input: GaugeInput, context: RuleContext): GaugeResult {
  const material = input.material.trim().toLowerCase()
  if (material !== 'steel') {
    refuse(`gauge: only sheet steel (Manufacturers' Standard Gauge) is carried; "${input.material}" `
      + 'uses a different gauge table, so give its thickness directly')
  }
  const row = steelGauge.get(input.gauge)
  if (!row) {
    refuse(`gauge: ${input.gauge} ga is not in the sheet-steel table carried here (${steelGauges.join(', ')})`)
  }
  const inchMicro = toMicro(row.inch)
  // 1 in = 25.4 mm exactly: micro-inches × 254 / 10 = micro-millimetres.
  const thickness = context.unit === 'in' ? fromMicro(inchMicro) : fromMicro(scale(inchMicro, 254, 10))
  const shown = context.unit === 'in' ? `${row.inch} in` : `${thickness} mm (${row.inch} in × 25.4)`
  return {
    thickness,
    gauge: input.gauge,
    material: 'steel',
    reasons: [{
      clause: 'Manufacturers\' Standard Gauge for sheet steel',
      text: `${input.gauge} ga sheet steel is ${shown} thick.`,
      basis: row.fromMemory ? 'memory' : 'verified',
    }],
  }
}
