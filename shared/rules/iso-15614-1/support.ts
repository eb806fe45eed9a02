import type { Reason } from '../types'
import { wpqrRanges, type WpqrTestPiece } from './ranges'

/**
 * Whether a WPS written to ISO 15609-1 stays inside what its WPQRs (ISO 15614-1) approve, variable by variable. A
 * variable the WPS or the WPQR leaves out is "cannot tell: record it", never "met". Clauses are those of clause 8 as
 * remembered (basis memory).
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
  pwht?: { done: boolean, temperature?: number, hours?: number }
  filler?: string
}

export type IsoFinding = Reason & { variable: string, state: 'met' | 'not-met' | 'not-recorded' }
export interface IsoSupport { answer: 'supported' | 'not-supported' | 'cannot-tell', supported: boolean, findings: IsoFinding[] }

const f = (variable: string, state: IsoFinding['state'], clause: string, text: string): IsoFinding => ({ variable, state, clause, text, basis: 'memory' })

function against(wps: IsoWps, piece: WpqrTestPiece): IsoFinding[] {
  const r = wpqrRanges(piece)
  const out: IsoFinding[] = []
  const same = wps.processes.length === r.processes.length && wps.processes.every((p, i) => p === r.processes[i])
  out.push(f('process', same ? 'met' : 'not-met', 'ISO 15614-1, 8.4.1', `WPS ${wps.processes.join(' + ')}; WPQR ${r.processes.join(' + ')}.`))
  if (!wps.thickness) out.push(f('thickness', 'not-recorded', 'ISO 15614-1, Table 6', 'The WPS thickness range is not given: cannot tell, record it.'))
  else {
    const ok = wps.thickness.min >= (r.thickness.min ?? 0) && (r.thickness.max === null || wps.thickness.max <= r.thickness.max)
    out.push(f('thickness', ok ? 'met' : 'not-met', 'ISO 15614-1, Table 6', `WPS ${wps.thickness.min}–${wps.thickness.max} mm; approved ${r.thickness.min}–${r.thickness.max} mm.`))
  }
  if (wps.form === 'pipe') {
    if (wps.outsideDiameterMin === undefined) out.push(f('diameter', 'not-recorded', 'ISO 15614-1, Table 7', 'The WPS pipe diameter is not given: cannot tell, record it.'))
    else if (!r.diameter) out.push(f('diameter', wps.outsideDiameterMin > 500 ? 'met' : 'not-met', 'ISO 15614-1, 8.3.2.2', `A plate test approves pipe over 500 mm; the WPS goes down to ${wps.outsideDiameterMin} mm.`))
    else out.push(f('diameter', wps.outsideDiameterMin >= (r.diameter.min ?? 0) ? 'met' : 'not-met', 'ISO 15614-1, Table 7', `WPS from ${wps.outsideDiameterMin} mm; approved from ${r.diameter.min} mm.`))
  }
  if (!wps.positions?.length) out.push(f('position', 'not-recorded', 'ISO 15614-1, 8.4.2', 'The WPS positions are not given: cannot tell, record them.'))
  else {
    const approved = r.positions as string[]
    const bad = wps.positions.filter(p => !approved.includes(p.toUpperCase()))
    out.push(f('position', bad.length ? 'not-met' : 'met', 'ISO 15614-1, 8.4.2', bad.length ? `Not approved: ${bad.join(', ')}.` : `All WPS positions approved (${approved.join(', ')}).`))
  }
  if (!wps.materialGroup || !piece.materialGroup) out.push(f('material', 'not-recorded', 'ISO 15614-1, 8.3.1.1, Table 3', 'The parent metal group (ISO/TR 15608) is not given on both: cannot tell, record it.'))
  else out.push(f('material', wps.materialGroup === piece.materialGroup ? 'met' : 'not-recorded', 'ISO 15614-1, 8.3.1.1, Table 3', wps.materialGroup === piece.materialGroup ? `Group ${wps.materialGroup} as tested.` : `Group ${wps.materialGroup} against ${piece.materialGroup} tested: the Table 3 cross-approvals are not carried: check by hand.`))
  if (r.heatInput) {
    const hi = wps.heatInput
    if (!hi || (r.heatInput.max !== null && hi.max === undefined) || (r.heatInput.min !== null && hi.min === undefined)) out.push(f('heat-input', 'not-recorded', 'ISO 15614-1, 8.4.8', 'The WPS heat input limits are not given: cannot tell, record them.'))
    else {
      const ok = (r.heatInput.max === null || hi.max! <= r.heatInput.max) && (r.heatInput.min === null || hi.min! >= r.heatInput.min)
      out.push(f('heat-input', ok ? 'met' : 'not-met', 'ISO 15614-1, 8.4.8', `WPS ${hi.min ?? '—'}–${hi.max ?? '—'} kJ/mm; approved ${r.heatInput.min ?? '—'}–${r.heatInput.max ?? '—'} kJ/mm.`))
    }
  }
  if (r.preheatMin === null || wps.preheatMin === undefined) out.push(f('preheat', 'not-recorded', 'ISO 15614-1, 8.4.6', 'Preheat not given on both: cannot tell, record it.'))
  else out.push(f('preheat', wps.preheatMin >= r.preheatMin ? 'met' : 'not-met', 'ISO 15614-1, 8.4.6', `WPS ${wps.preheatMin} °C; not lower than ${r.preheatMin} °C.`))
  if (r.interpassMax === null || wps.interpassMax === undefined) out.push(f('interpass', 'not-recorded', 'ISO 15614-1, 8.4.7', 'Interpass not given on both: cannot tell, record it.'))
  else out.push(f('interpass', wps.interpassMax <= r.interpassMax ? 'met' : 'not-met', 'ISO 15614-1, 8.4.7', `WPS ${wps.interpassMax} °C; not over ${r.interpassMax} °C.`))
  if (!r.pwht || !wps.pwht) out.push(f('pwht', 'not-recorded', 'ISO 15614-1, 8.4.9', 'PWHT not stated on both: cannot tell, record it.'))
  else {
    const ok = r.pwht.done === wps.pwht.done && (!r.pwht.done || (r.pwht.temperature === wps.pwht.temperature && r.pwht.hours === wps.pwht.hours))
    out.push(f('pwht', ok ? 'met' : 'not-met', 'ISO 15614-1, 8.4.9', ok ? 'PWHT as tested.' : 'The PWHT differs from the test.'))
  }
  if (!r.filler || !wps.filler) out.push(f('filler', 'not-recorded', 'ISO 15614-1, 8.4.4', 'Filler designation not given on both: cannot tell, record it.'))
  else out.push(f('filler', r.filler.trim() === wps.filler.trim() ? 'met' : 'not-met', 'ISO 15614-1, 8.4.4', `WPS ${wps.filler}; WPQR ${r.filler}.`))
  return out
}

/** The WPS against each WPQR: supported when one WPQR meets every variable; cannot-tell when none fails but one is unknown. */
export function isoWpsSupport(wps: IsoWps, wpqrs: WpqrTestPiece[]): IsoSupport {
  if (wpqrs.length === 0) return { answer: 'not-supported', supported: false, findings: [f('wpqr', 'not-met', 'ISO 15614-1, 1', 'No WPQR supports this WPS.')] }
  const each = wpqrs.map(p => against(wps, p))
  const best = each.find(list => list.every(x => x.state === 'met')) ?? each.find(list => list.every(x => x.state !== 'not-met')) ?? each[0]!
  const answer = best.every(x => x.state === 'met') ? 'supported' : best.some(x => x.state === 'not-met') ? 'not-supported' : 'cannot-tell'
  return { answer, supported: answer === 'supported', findings: best }
}
