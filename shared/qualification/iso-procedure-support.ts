import { isoWpsSupport, type IsoWps, type WpqrTestPiece } from '../rules/iso-15614-1'
import { convertLength } from '../rules/units'
import type { Unit } from '../rules/types'

/** ISO 4063 numbers for the process names a procedure record uses (from memory; GMAW read as MAG 135 on both sides). */
const iso4063: Record<string, string> = { SMAW: '111', SAW: '121', GMAW: '135', FCAW: '136', GTAW: '141', PAW: '15', OFW: '311' }

interface Wps { unit: Unit, process: string, thickness?: { groove?: { min?: number | null, max?: number | null } }, toughnessRequired?: boolean, baseMetals?: { a?: { pNumber?: string | null } }, electrical?: { heatInputMax?: number | null } }
interface Pqr { number: string, unit: Unit, process: string, couponThickness: number, heatInput: number | null, toughnessTested: boolean, pNumber: string | null }
export interface IsoSupportFinding { met: boolean, clause: string, text: string, basis: 'memory', field: string | null }

const fieldOf: Record<string, string | null> = { 'process': 'process', 'thickness': 'thickness.groove', 'heat-input': 'electrical.heatInputMax', 'material': 'baseMetals' }
const mm = (v: number, unit: Unit) => (unit === 'mm' ? v : convertLength(v, 'in', 'mm'))
// Heat input per length as stored (J/mm in a mm record, J/in in an inch record) in kJ/mm.
const kJmm = (v: number, unit: Unit) => (unit === 'mm' ? v : v / 25.4) / 1000

/**
 * A WPS recorded with the ISO code (ISO 15609-1) against its WPQRs (ISO 15614-1), variable by variable, with what the
 * procedure record holds: process, thickness, heat input with impact tests, parent metal group. What it does not hold
 * (positions, preheat, interpass, PWHT, filler designation) is "cannot tell", never met.
 */
export function isoProcedureFindings(wps: Wps, pqrs: Pqr[]): IsoSupportFinding[] {
  const g = wps.thickness?.groove
  const iso: IsoWps = {
    processes: [iso4063[wps.process] ?? wps.process], form: 'plate',
    ...(typeof g?.min === 'number' && typeof g?.max === 'number' ? { thickness: { min: mm(g.min, wps.unit), max: mm(g.max, wps.unit) } } : {}),
    ...(wps.baseMetals?.a?.pNumber ? { materialGroup: wps.baseMetals.a.pNumber } : {}),
    ...(typeof wps.electrical?.heatInputMax === 'number' ? { heatInput: { max: kJmm(wps.electrical.heatInputMax, wps.unit) } } : {}),
  }
  const pieces: WpqrTestPiece[] = pqrs.map(p => ({
    processes: [iso4063[p.process] ?? p.process], form: 'plate', thickness: mm(p.couponThickness, p.unit), positions: ['PA'],
    ...(p.pNumber ? { materialGroup: p.pNumber } : {}), impactTested: wps.toughnessRequired ?? p.toughnessTested,
    ...(p.heatInput !== null ? { heatInputMax: kJmm(p.heatInput, p.unit) } : {}),
  }))
  const answer = isoWpsSupport(iso, pieces)
  return answer.findings
    // The WPQR's positions are not held on the record: its position finding would be invented, so it is left to the hand check below.
    .filter(f => f.variable !== 'position')
    .map(f => ({ met: f.state === 'met', clause: f.clause, basis: 'memory' as const, field: fieldOf[f.variable] ?? null, text: f.state === 'not-recorded' ? `Cannot tell: ${f.text}` : f.text }))
    .concat([{ met: false, clause: 'ISO 15614-1, 8.4.2', basis: 'memory', field: 'positions', text: 'Cannot tell: positions approved by the WPQR (8.4.2) are not compared here; check by hand.' }])
}
