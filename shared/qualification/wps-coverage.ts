import type { CoverReason } from '../rules/results'
import type { CodeId, Unit } from '../rules/types'
import { codeName } from '../rules/caution'
import { convertLength, formatRange, toMicro } from '../rules/units'

export interface ProcedureRanges {
  code: CodeId
  unit: Unit
  process: string
  transfer: string | null
  pNumberA: string | null
  pNumberB: string | null
  thicknessMin: number | null
  thicknessMax: number | null
  diameterMin: number | null
  positions: string[]
  fNumbers: string[]
}

export interface JointToWeld {
  process: string
  transfer?: string
  unit: Unit
  pNumber?: string
  thickness?: number
  form: 'plate' | 'pipe'
  outsideDiameter?: number
  weld: 'groove' | 'fillet'
  /** One position, or `positions` for a joint welded in several (each must be listed on the WPS). */
  position?: string
  positions?: string[]
  fNumber?: number
  /** The code the joint is welded to: a WPS of another code does not cover it. */
  code?: CodeId
}

const asmeClauses = { process: 'QW-401', transfer: 'QW-409.2', pNumber: 'QW-403.11, QW-424', thickness: 'QW-403.8, QW-451.1', fillet: 'QW-202.2(c)', position: 'QW-405.1', fNumber: 'QW-404.4', diameter: 'WPS stated range' }
const clausesOf = (code: CodeId) => (code === 'asme-ix'
  ? asmeClauses
  : {
      process: 'WPS process', transfer: 'WPS transfer mode', pNumber: 'WPS base metals', thickness: 'WPS thickness range', fillet: 'WPS fillet range',
      position: 'WPS positions', fNumber: 'WPS filler metals', diameter: 'WPS stated range',
    })

/**
 * Whether an approved WPS's stated ranges take in a production joint, one finding per variable.
 * Lengths of the joint are converted into the WPS's unit before they are compared.
 */
export function procedureCovers(wps: ProcedureRanges, joint: JointToWeld): { covered: boolean, reasons: CoverReason[] } {
  const c = clausesOf(wps.code)
  const u = wps.unit
  const reasons: CoverReason[] = []
  const add = (met: boolean, clause: string, text: string) => reasons.push({ met, clause, text, basis: 'convention' })
  // A variable the WPS limits and the joint leaves out is "cannot tell: state it", never taken as inside the WPS.
  const unstated = (clause: string, what: string, field: string) => reasons.push({
    met: false, state: 'not-recorded', clause, text: `The joint does not state its ${what}: cannot tell, state it.`, basis: 'convention', record: `production.${field}`,
  })
  const inUnit = (v: number) => convertLength(v, joint.unit, u)

  if (joint.code !== undefined) add(wps.code === joint.code, 'code', wps.code === joint.code ? `The WPS is written to ${codeName(wps.code)}, the joint's code.` : `The WPS is written to ${codeName(wps.code)}; the joint is welded to ${codeName(joint.code)}.`)
  add(wps.process === joint.process, c.process, `Process ${wps.process}${wps.process === joint.process ? '' : `, not ${joint.process}`}.`)
  if (joint.transfer && wps.transfer) {
    const sameFamily = (wps.transfer === 'short-circuit') === (joint.transfer === 'short-circuit')
    add(sameFamily, c.transfer, `Transfer ${wps.transfer}; the joint calls for ${joint.transfer}.`)
  }
  if (joint.pNumber) {
    const listed = [wps.pNumberA, wps.pNumberB].filter(Boolean).map(p => p!.toUpperCase())
    const ok = listed.includes(joint.pNumber.toUpperCase())
    add(ok, c.pNumber, `Base metals P-No. ${wps.pNumberA ?? '—'} to P-No. ${wps.pNumberB ?? '—'}; the joint is P-No. ${joint.pNumber}.`)
  }
  else if (wps.pNumberA || wps.pNumberB) unstated(c.pNumber, 'base metal P-No.', 'pNumber')
  if (joint.thickness !== undefined) {
    if (joint.weld === 'fillet' && wps.code === 'asme-ix') {
      add(true, c.fillet, 'Fillet welds: a groove-qualified WPS takes in all fillet sizes on all base metal thicknesses.')
    }
    else {
      const t = inUnit(joint.thickness)
      const ok = (wps.thicknessMin === null || toMicro(t) >= toMicro(wps.thicknessMin)) && (wps.thicknessMax === null || toMicro(t) <= toMicro(wps.thicknessMax))
      const range = formatRange(wps.thicknessMin === null ? null : toMicro(wps.thicknessMin), wps.thicknessMax === null ? null : toMicro(wps.thicknessMax), u)
      add(ok, c.thickness, `Thickness ${t} ${u}: the WPS covers ${range}.`)
    }
  }
  else if (!(joint.weld === 'fillet' && wps.code === 'asme-ix') && (wps.thicknessMin !== null || wps.thicknessMax !== null)) unstated(c.thickness, 'thickness', 'thickness')
  if (joint.form === 'pipe' && joint.outsideDiameter !== undefined && wps.diameterMin !== null) {
    const od = inUnit(joint.outsideDiameter)
    add(toMicro(od) >= toMicro(wps.diameterMin), c.diameter, `Pipe OD ${od} ${u}: the WPS states ${wps.diameterMin} ${u} and over.`)
  }
  else if (joint.form === 'pipe' && wps.diameterMin !== null) unstated(c.diameter, 'pipe outside diameter', 'outsideDiameter')
  const positions = [...new Set([...(joint.positions ?? []), ...(joint.position ? [joint.position] : [])].map(p => p.toUpperCase()))]
  const missing = positions.filter(p => !wps.positions.includes(p))
  add(positions.length > 0 && missing.length === 0, c.position, `Position ${positions.join(', ') || 'not given'}: the WPS lists ${wps.positions.join(', ') || 'none'}.`)
  if (joint.fNumber !== undefined) {
    add(wps.fNumbers.includes(String(joint.fNumber)), c.fNumber, `F-No. ${joint.fNumber}: the WPS lists F-No. ${wps.fNumbers.join(', ') || 'none'}.`)
  }
  else if (wps.fNumbers.length) unstated(c.fNumber, 'filler F-No.', 'fNumber')
  return { covered: reasons.every(r => r.met), reasons }
}
