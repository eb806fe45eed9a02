// Every answer of the rules carries its reasons in words: the user reads them beside the range ("never a false
// yes" needs the why). Swept over the branches of each table (the boundary values of docs/sources.md), every
// reason must name a clause and say something; and the words must name the rule that applied.
import { describe, expect, it } from 'vitest'
import { ok } from '../helpers'

type Unit = 'in' | 'mm'
interface Reason { clause: string, text: string, basis: string }

const requests: { label: string, request: Record<string, unknown> }[] = []
const add = (label: string, request: Record<string, unknown>) => requests.push({ label, request })

// ASME QW-451.1 and its modifiers, both units, both sides of each band
const asmeT: Record<Unit, number[]> = { in: [0.05, 0.0625, 0.25, 0.375, 0.5, 0.75, 1, 1.5, 6, 7], mm: [1.4, 1.5, 6, 10, 13, 19, 25, 38, 150, 160] }
for (const unit of ['in', 'mm'] as const) {
  for (const T of asmeT[unit]) {
    for (const process of ['SMAW', 'FCAW']) {
      add(`asme procedure ${process} ${T} ${unit}`, { code: 'asme-ix', check: 'procedure-ranges', unit, input: { process, couponThickness: T, toughness: true, maxPassThickness: T } })
    }
    for (const edition of ['2019', '2023']) {
      add(`asme GMAW-S ${T} ${unit} ${edition}`, { code: 'asme-ix', edition, check: 'procedure-ranges', unit, input: { process: 'GMAW', transfer: 'short-circuit', couponThickness: T, depositThickness: T / 2 } })
    }
    add(`asme welder groove ${T} ${unit}`, { code: 'asme-ix', check: 'welder-ranges', unit, input: { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: ['2G', '5G'], couponThickness: T, layers: 3, outsideDiameter: unit === 'in' ? 2 : 50 } })
    add(`asme welder GMAW-S ${T} ${unit}`, { code: 'asme-ix', check: 'welder-ranges', unit, input: { process: 'GMAW', transfer: 'short-circuit', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: T } })
    add(`asme welder fillet ${T} ${unit}`, { code: 'asme-ix', check: 'welder-ranges', unit, input: { process: 'SMAW', form: 'plate', weld: 'fillet', testPositions: ['2F'], couponThickness: T } })
  }
}
for (const od of [0.5, 1, 2.875, 4]) add(`asme pipe fillet OD ${od}`, { code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'pipe', weld: 'fillet', testPositions: ['2FR'], couponThickness: 0.25, outsideDiameter: od } })
for (const size of [0.1, 0.2]) {
  add(`asme bend ${size}`, { code: 'asme-ix', check: 'bend', unit: 'in', input: { specimens: [{ type: 'face', indications: [{ size }, { size: 0.3, atCorner: true }] }] } })
}
for (const t of [0.25, 0.6, 3]) {
  add(`asme rt ${t}`, { code: 'asme-ix', check: 'radiography', unit: 'in', input: { thickness: t, indications: [{ kind: 'slag', length: 0.1 }, { kind: 'slag', length: 0.05 }, { kind: 'rounded', length: 0.05 }] } })
}
// AWS D1.1
for (const T of [0.375, 0.5, 1]) add(`d1.1 plate ${T}`, { code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G', '4G'], couponThickness: T } })
for (const [od, wall] of [[4, 0.25], [6.625, 0.25], [6.625, 0.5]] as const) {
  for (const pos of ['1G', '6G']) add(`d1.1 pipe ${od} ${wall} ${pos}`, { code: 'aws-d1.1', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'pipe', weld: 'groove', testPositions: [pos], couponThickness: wall, outsideDiameter: od } })
}
for (const indications of [[{ size: 0.1 }], [{ size: 0.2 }], [{ size: 0.1 }, { size: 0.1 }, { size: 0.1 }, { size: 0.1 }], [{ size: 0.3, atCorner: true }], [{ size: 0.2, atCorner: true }]]) {
  for (const unit of ['in', 'mm'] as const) add(`d1.1 bend ${JSON.stringify(indications)} ${unit}`, { code: 'aws-d1.1', check: 'bend', unit, input: { specimens: [{ type: 'side', indications }] } })
}
// AWS D1.3
for (const joint of ['square-groove', 'flare-groove', 'fillet', 'arc-spot', 'arc-seam']) {
  for (const t of [0.06, 0.12]) {
    const groove = joint.endsWith('groove')
    add(`d1.3 ${joint} ${t}`, { code: 'aws-d1.3', check: 'welder-ranges', unit: 'in', input: { process: 'GMAW', form: 'plate', weld: groove ? 'groove' : 'fillet', joint, testPositions: [groove ? '2G' : '1F'], couponThickness: t } })
  }
}
// ISO 9606-1
for (const s of [2, 3, 11.9, 12, 15]) {
  add(`iso butt ${s}`, { code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '135', transfer: 'short-circuit', form: 'pipe', weld: 'groove', testPositions: ['PC', 'PH'], depositThickness: s, outsideDiameter: s * 10, fNumber: 1 } })
  add(`iso 311 ${s}`, { code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '311', form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: Math.min(s, 11) } })
}
for (const t of [2, 3, 10]) add(`iso fillet ${t}`, { code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process: '141', transfer: 'spray', form: 'plate', weld: 'fillet', testPositions: ['PD'], couponThickness: t } })

describe('every reason names a clause and says something (the boundary sweep of docs/sources.md)', () => {
  it('the sweep is not empty', () => {
    expect(requests.length).toBeGreaterThan(100)
  })
  it.each(requests)('$label', ({ request }) => {
    const r = ok(request)
    const reasons = r.reasons as Reason[]
    expect(reasons.length).toBeGreaterThan(0)
    for (const reason of reasons) {
      expect(reason.clause.trim().length, JSON.stringify(reason)).toBeGreaterThan(2)
      expect(reason.text.trim().length, JSON.stringify(reason)).toBeGreaterThan(10)
      expect(['verified', 'partial', 'memory', 'convention']).toContain(reason.basis)
    }
    if (Array.isArray(r.specimens)) {
      for (const specimen of r.specimens as { reason: string }[]) expect(specimen.reason.trim().length).toBeGreaterThan(10)
    }
    if (typeof r.reason === 'string') expect(r.reason.trim().length).toBeGreaterThan(10)
  })
})

describe('the words name the rule that applied', () => {
  const text = (request: Record<string, unknown>, clause: string) =>
    (ok(request).reasons as Reason[]).filter(r => r.clause === clause).map(r => r.text).join(' | ')
  const procedure = (input: Record<string, unknown>, unit: Unit = 'in', edition?: string) => ({ code: 'asme-ix', ...(edition ? { edition } : {}), check: 'procedure-ranges', unit, input })

  it('QW-403.6: T/2 under 1/4 in, "T or 5/8 in" from 1/4 in (docs/sources.md §A1.6)', () => {
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.2, toughness: true }), 'QW-403.6')).toContain('T/2')
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.25, toughness: true }), 'QW-403.6')).toContain('5/8 in')
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.25, toughness: true }), 'QW-403.6')).not.toContain('T/2')
  })
  it('QW-451.1 band texts name the band (docs/sources.md §A1)', () => {
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.05 }), 'QW-451.1')).toContain('under 1/16 in')
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.375 }), 'QW-451.1')).toContain('3/8 in inclusive')
    expect(text(procedure({ process: 'SMAW', couponThickness: 0.5 }), 'QW-451.1')).toContain('over 3/8 in and under 3/4 in')
    expect(text(procedure({ process: 'SMAW', couponThickness: 1 }), 'QW-451.1')).toContain('to under 1-1/2 in')
    expect(text(procedure({ process: 'SMAW', couponThickness: 2 }), 'QW-451.1')).toContain('Note 3: SMAW')
    expect(text(procedure({ process: 'FCAW', couponThickness: 2 }), 'QW-451.1')).toContain('not FCAW')
    expect(text(procedure({ process: 'SMAW', couponThickness: 7 }), 'QW-451.1')).toContain('1.33T')
    expect(text(procedure({ process: 'SMAW', couponThickness: 1 }), 'QW-451.1')).toContain('Specimens: 2 tension, 0 face, 0 root, 4 side bends')
  })
  it('QW-403.10 and QW-404.32 name 1.1T / 1.1t and the edition; 2021 and later say they are not referenced (§A1.10)', () => {
    const old = procedure({ process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.25 }, 'in', '2019')
    expect(text(old, 'QW-403.10')).toContain('1.1T')
    expect(text(old, 'QW-403.10')).toContain('2019')
    expect(text(old, 'QW-404.32')).toContain('1.1t')
    expect(text(procedure({ process: 'GMAW', transfer: 'short-circuit', couponThickness: 0.25 }, 'in', '2023'), 'QW-255')).toContain('no longer referenced')
  })
  it('QW-403.9 names the pass and 1.1T (§A1.9)', () => {
    expect(text(procedure({ process: 'SAW', couponThickness: 1, maxPassThickness: 0.625 }), 'QW-403.9')).toContain('1.1T')
  })
  it('QW-452.1(b) says when the 3-layer rule was not met (§A2b)', () => {
    const r = { code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['1G'], couponThickness: 0.5, layers: 2 } }
    expect(text(r, 'QW-452.1(b)')).toContain('2 layers were welded')
  })
  it('D1.1 bend texts name the limit that failed (§B3)', () => {
    const specimens = (indications: unknown[]) => ok({ code: 'aws-d1.1', check: 'bend', unit: 'in', input: { specimens: [{ type: 'face', indications }] } }).specimens as { reason: string }[]
    expect(specimens([{ size: 0.2 }])[0]!.reason).toContain('exceeds 1/8 in')
    expect(specimens([{ size: 0.125 }, { size: 0.125 }, { size: 0.125 }, { size: 0.0625 }])[0]!.reason).toContain('more than 3/8 in')
    expect(specimens([{ size: 0.3, atCorner: true }])[0]!.reason).toContain('replacement')
  })
  it('ISO Table 6 names the factor: 1.5 for gas welding, 2 otherwise (§C6)', () => {
    const iso = (process: string) => ({ code: 'iso-9606-1', check: 'welder-ranges', unit: 'mm', input: { process, form: 'plate', weld: 'groove', testPositions: ['PA'], depositThickness: 5 } })
    expect(text(iso('311'), 'ISO 9606-1 Table 6')).toContain('factor 1.5')
    expect(text(iso('135'), 'ISO 9606-1 Table 6')).toContain('factor 2')
  })
})
