/**
 * The designation of an ISO 9606-1 test, written the standard's way (clause 10, as the worked examples of the summary
 * sheets write it: "ISO 9606-1 136 P BW FM1 B s15 PE ss nb", "ISO 9606-1 135 P FW FM1 S t10 PB ml"):
 * number of this standard, process(es) (ISO 4063), product type P/T, weld type BW/FW, filler group, filler type,
 * dimensions (s deposit for a butt weld when recorded, else t; D for pipe), position(s) (ISO 6947), weld details.
 * Decimals take a comma, as the examples do ("s3,6"). Combination: "141/135", "s3/s7" (from memory).
 */
export interface DesignationInput {
  processes: { process: string, depositThickness?: number | null }[]
  form: 'plate' | 'pipe'
  weld: 'groove' | 'fillet'
  fillerGroup?: number | null
  fillerType?: string | null
  couponThickness?: number | null
  outsideDiameter?: number | null
  positions: readonly string[]
  /** Butt: 'ss nb' | 'ss mb' | 'bs'; fillet: 'sl' | 'ml'. */
  details?: string | null
  /** Both sides: back gouged (gg) or not (ng). */
  gouging?: 'gg' | 'ng' | null
}

const n = (v: number) => String(Math.round(v * 100) / 100).replace('.', ',')

/** The designation, with a "?" where a part was not recorded (never a guessed value). */
export function designation(input: DesignationInput): string {
  const parts: string[] = ['ISO 9606-1']
  parts.push(input.processes.map(p => p.process).join('/') || '?')
  parts.push(input.form === 'pipe' ? 'T' : 'P')
  parts.push(input.weld === 'groove' ? 'BW' : 'FW')
  parts.push(input.fillerGroup ? `FM${input.fillerGroup}` : 'FM?')
  parts.push(input.fillerType || '?')
  const deposits = input.processes.map(p => p.depositThickness)
  const dims: string[] = []
  if (input.weld === 'groove' && deposits.length > 0 && deposits.every(d => d !== null && d !== undefined)) dims.push(deposits.map(d => `s${n(d!)}`).join('/'))
  else dims.push(input.couponThickness ? `t${n(input.couponThickness)}` : 't?')
  if (input.form === 'pipe') dims.push(input.outsideDiameter ? `D${n(input.outsideDiameter)}` : 'D?')
  parts.push(dims.join(' '))
  parts.push(input.positions.length ? input.positions.join(' ') : '?')
  if (input.details) parts.push(input.details)
  if (input.weld === 'groove' && input.details === 'bs' && input.gouging) parts.push(input.gouging)
  return parts.join(' ')
}
