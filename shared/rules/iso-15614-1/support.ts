import type { Reason } from '../types'
import { wpqrRanges, type WpqrTestPiece, type WpqrVariable } from './ranges'

/**
 * Whether a WPS written to ISO 15609-1 stays inside what its WPQRs (ISO 15614-1:2017) qualify, variable by variable.
 * A variable the WPS or the WPQR leaves out is "cannot tell: record it"; one Rootface does not decide (Table 3 group
 * cross-approvals, another filler designation, the PWHT holding time) is "check by hand". Neither is ever "met".
 */
export interface IsoWps {
  processes: string[]
  form?: 'plate' | 'pipe'
  thickness?: { min: number, max: number }
  outsideDiameterMin?: number
  positions?: string[]
  materialGroup?: string
  heatInput?: { min?: number, max?: number }
  preheatMin?: number
  interpassMax?: number
  pwht?: { done: boolean, temperature?: { min: number, max: number }, hours?: number }
  filler?: string
}

export type IsoFindingState = 'met' | 'not-met' | 'not-recorded' | 'by-hand'
export type IsoFinding = Reason & { variable: WpqrVariable | 'wpqr', state: IsoFindingState }
export interface IsoSupport { answer: 'supported' | 'not-supported' | 'cannot-tell', supported: boolean, wpqr: number | null, findings: IsoFinding[] }

const f = (variable: IsoFinding['variable'], state: IsoFindingState, clause: string, text: string): IsoFinding => ({ variable, state, clause: `ISO 15614-1:2017, ${clause}`, text, basis: 'memory' })
const inside = (v: number, min: number | null, max: number | null) => (min === null || v >= min - 1e-9) && (max === null || v <= max + 1e-9)

/** The WPS against one WPQR, one finding per variable of clause 8. */
export function againstWpqr(wps: IsoWps, piece: WpqrTestPiece): IsoFinding[] {
  const r = wpqrRanges(piece)
  const out: IsoFinding[] = []
  const same = wps.processes.length === r.processes.length && wps.processes.every((p, i) => p === r.processes[i])
  out.push(f('process', same ? 'met' : 'not-met', '8.4.1', `WPS ${wps.processes.join(' + ')}; WPQR ${r.processes.join(' + ')}.`))

  if (!wps.thickness) out.push(f('thickness', 'not-recorded', '8.3.2.1, Table 6', 'Cannot tell: record the WPS thickness range.'))
  else {
    const ok = inside(wps.thickness.min, r.thickness.min, r.thickness.max) && inside(wps.thickness.max, r.thickness.min, r.thickness.max)
    out.push(f('thickness', ok ? 'met' : 'not-met', '8.3.2.1, Table 6', `WPS ${wps.thickness.min} to ${wps.thickness.max} mm; qualified ${r.thickness.min} to ${r.thickness.max} mm.`))
  }

  if (wps.form === 'pipe') {
    if (wps.outsideDiameterMin === undefined) out.push(f('diameter', 'not-recorded', '8.3.2.2, Table 7', 'Cannot tell: record the smallest pipe outside diameter of the WPS.'))
    else if (!r.diameter) out.push(f('diameter', wps.outsideDiameterMin > 500 ? 'met' : 'by-hand', '8.3.2.2', wps.outsideDiameterMin > 500 ? `A plate test qualifies pipe over 500 mm; the WPS starts at ${wps.outsideDiameterMin} mm.` : `Check by hand: a plate test qualifies pipe over 500 mm (over 150 mm only rotated in PA or PC); the WPS goes down to ${wps.outsideDiameterMin} mm.`))
    else out.push(f('diameter', inside(wps.outsideDiameterMin, r.diameter.min, r.diameter.max) ? 'met' : 'not-met', '8.3.2.2, Table 7', `WPS from ${wps.outsideDiameterMin} mm; qualified ${r.diameter.min} mm${r.diameter.max === null ? ' and over' : ` to ${r.diameter.max} mm`}.`))
  }
  else if (wps.form === undefined) out.push(f('diameter', 'not-recorded', '8.3.2.2', 'Cannot tell: record whether the WPS is for plate or pipe.'))
  else if (r.diameter) out.push(f('diameter', 'by-hand', '8.3.2.2', 'Check by hand: a pipe test piece and a plate WPS (pipe tests over 25 mm cover plate, from memory).'))
  else out.push(f('diameter', 'met', '8.3.2.2', 'Plate as tested.'))

  if (!wps.positions?.length) out.push(f('position', 'not-recorded', '8.4.2', 'Cannot tell: record the WPS positions.'))
  else {
    const bad = wps.positions.filter(p => !r.positions.includes(p.toUpperCase()))
    out.push(f('position', bad.length ? 'not-met' : 'met', '8.4.2', bad.length ? `Not qualified: ${bad.join(', ')} (qualified ${r.positions.join(', ')}).` : `Every WPS position is qualified (${r.positions.join(', ')}).`))
  }

  if (!wps.materialGroup || !piece.materialGroup) out.push(f('material', 'not-recorded', '8.3.1.1, Table 3', `Cannot tell: record the parent metal group (ISO/TR 15608) on the ${!wps.materialGroup ? 'WPS' : 'WPQR'}.`))
  else if (wps.materialGroup.trim() === piece.materialGroup.trim()) out.push(f('material', 'met', '8.3.1.1, Table 3', `Group ${wps.materialGroup} as tested.`))
  else out.push(f('material', 'by-hand', '8.3.1.1, Table 3', `Check by hand: group ${wps.materialGroup} against ${piece.materialGroup} tested; the Table 3 cross-qualifications are not carried.`))

  if (r.heatInput) {
    const hi = wps.heatInput
    const missing = [r.heatInput.max !== null && hi?.max === undefined ? 'maximum' : null, r.heatInput.min !== null && hi?.min === undefined ? 'minimum' : null].filter(Boolean)
    if ((piece.impactTested && piece.heatInputMax === undefined) || (piece.hardnessTested && piece.heatInputMin === undefined)) out.push(f('heat-input', 'not-recorded', '8.4.8', 'Cannot tell: record the heat input of each layer on the WPQR.'))
    else if (missing.length) out.push(f('heat-input', 'not-recorded', '8.4.8', `Cannot tell: record the WPS heat input ${missing.join(' and ')}.`))
    else {
      const ok = (r.heatInput.max === null || hi!.max! <= r.heatInput.max + 1e-9) && (r.heatInput.min === null || hi!.min! >= r.heatInput.min - 1e-9)
      out.push(f('heat-input', ok ? 'met' : 'not-met', '8.4.8', `WPS ${hi?.min ?? '—'} to ${hi?.max ?? '—'} kJ/mm; qualified ${r.heatInput.min ?? '—'} to ${r.heatInput.max ?? '—'} kJ/mm.`))
    }
  }
  else out.push(f('heat-input', 'met', '8.4.8', 'No impact or hardness tests on the WPQR: heat input is not limited by it.'))

  if (r.preheatMin === null || wps.preheatMin === undefined) out.push(f('preheat', 'not-recorded', '8.4.6', `Cannot tell: record the preheat on the ${r.preheatMin === null ? 'WPQR' : 'WPS'}.`))
  else out.push(f('preheat', wps.preheatMin >= r.preheatMin ? 'met' : 'not-met', '8.4.6', `WPS ${wps.preheatMin} °C; not lower than ${r.preheatMin} °C.`))

  if (r.interpassMax === null || wps.interpassMax === undefined) out.push(f('interpass', 'not-recorded', '8.4.7', `Cannot tell: record the interpass temperature on the ${r.interpassMax === null ? 'WPQR' : 'WPS'}.`))
  else out.push(f('interpass', wps.interpassMax <= r.interpassMax ? 'met' : 'not-met', '8.4.7', `WPS ${wps.interpassMax} °C; not over ${r.interpassMax} °C.`))

  if (!r.pwht || !wps.pwht) out.push(f('pwht', 'not-recorded', '8.4.9', `Cannot tell: state the PWHT (or none) on the ${!r.pwht ? 'WPQR' : 'WPS'}.`))
  else if (r.pwht.done !== wps.pwht.done) out.push(f('pwht', 'not-met', '8.4.9', r.pwht.done ? 'The WPQR was heat treated; the WPS is not.' : 'The WPQR was as welded; the WPS adds a PWHT.'))
  else if (!r.pwht.done) out.push(f('pwht', 'met', '8.4.9', 'As welded, as tested.'))
  else if (!r.pwht.temperature || !wps.pwht.temperature) out.push(f('pwht', 'not-recorded', '8.4.9', 'Cannot tell: record the PWHT holding temperature on both.'))
  else if (!inside(wps.pwht.temperature.min, r.pwht.temperature.min, r.pwht.temperature.max) || !inside(wps.pwht.temperature.max, r.pwht.temperature.min, r.pwht.temperature.max)) out.push(f('pwht', 'not-met', '8.4.9', `WPS ${wps.pwht.temperature.min} to ${wps.pwht.temperature.max} °C; qualified ${r.pwht.temperature.min} to ${r.pwht.temperature.max} °C.`))
  else if (r.pwht.hours === null || wps.pwht.hours === undefined || wps.pwht.hours !== r.pwht.hours) out.push(f('pwht', 'by-hand', '8.4.9', 'Temperature within ±20 °C of the test; check the holding time by hand (it is related to the product).'))
  else out.push(f('pwht', 'met', '8.4.9', `Held at ${wps.pwht.temperature.min} to ${wps.pwht.temperature.max} °C for ${wps.pwht.hours} h, as tested.`))

  if (!r.filler || !wps.filler) out.push(f('filler', 'not-recorded', '8.4.4', `Cannot tell: record the filler designation on the ${!r.filler ? 'WPQR' : 'WPS'}.`))
  else if (norm(r.filler.designation) === norm(wps.filler)) out.push(f('filler', 'met', '8.4.4', `Filler ${wps.filler}, as tested.`))
  else out.push(f('filler', 'by-hand', '8.4.4', `Check by hand: WPS filler ${wps.filler}; WPQR ${r.filler.designation}.`))
  return out
}

const norm = (s: string) => s.trim().replace(/\s+/g, ' ').toUpperCase()

/**
 * The WPS against each WPQR: supported only when one WPQR meets every variable; not supported when each WPQR fails at
 * least one; otherwise cannot tell (something to record or check by hand). `wpqr` is the index of the WPQR reported.
 */
export function isoWpsSupport(wps: IsoWps, wpqrs: WpqrTestPiece[]): IsoSupport {
  if (wpqrs.length === 0) return { answer: 'not-supported', supported: false, wpqr: null, findings: [{ variable: 'wpqr', state: 'not-met', clause: 'ISO 15614-1:2017, 5', text: 'No WPQR supports this WPS.', basis: 'convention' }] }
  const each = wpqrs.map(p => againstWpqr(wps, p))
  let i = each.findIndex(list => list.every(x => x.state === 'met'))
  if (i < 0) i = each.findIndex(list => list.every(x => x.state !== 'not-met'))
  if (i < 0) i = 0
  const best = each[i]!
  const answer = best.every(x => x.state === 'met') ? 'supported' : best.some(x => x.state === 'not-met') ? 'not-supported' : 'cannot-tell'
  return { answer, supported: answer === 'supported', wpqr: i, findings: best }
}
