import type { WelderRangesResult } from '../rules/results'
import type { Unit } from '../rules/types'

const positionWords: Record<string, string> = { F: 'flat', H: 'horizontal', V: 'vertical', O: 'overhead' }

/** Positions in plain words: "flat, vertical" or "every position". */
export function positionsInWords(letters: readonly string[]): string {
  if (!letters.length) return 'no position'
  if (['F', 'H', 'V', 'O'].every(l => letters.includes(l))) return 'every position'
  return letters.map(l => positionWords[l] ?? l).join(', ')
}

const len = (v: number, unit: Unit) => `${Number(v.toFixed(4))} ${unit}`

/** What a test qualifies, as short sentences a welder reads on the shop floor. */
export function rangesInWords(r: WelderRangesResult, unit: Unit): string[] {
  const lines: string[] = []
  const p = r.positions
  if (p.groove.length) lines.push(`Groove welds on plate (and pipe over ${unit === 'mm' ? '610 mm' : '24 in'} OD): ${positionsInWords(p.groove)}.`)
  if (p.groovePipe?.length) {
    const min = p.groovePipeMinDiameter ?? r.diameter?.min
    lines.push(`Groove welds on pipe${min ? ` of ${len(min, unit)} OD and over` : ''}: ${positionsInWords(p.groovePipe)}.`)
  }
  if (p.fillet.length) lines.push(`Fillet welds: ${positionsInWords(p.fillet)}.`)
  if (r.depositMax === null) lines.push('Weld metal thickness: no upper limit.')
  else if (r.depositMax !== undefined) lines.push(`Weld metal up to ${len(r.depositMax, unit)} thick.`)
  if (r.thickness && (r.thickness.min !== null || r.thickness.max !== null)) {
    lines.push(`Base metal ${r.thickness.min === null ? 'up to' : `from ${len(r.thickness.min, unit)}`}${r.thickness.max === null ? ' with no upper limit' : `${r.thickness.min === null ? '' : ' to'} ${len(r.thickness.max, unit)}`}.`)
  }
  if (r.fNumbers) lines.push(`Filler F-No. ${r.fNumbers.numbers.join(', ')}, ${r.fNumbers.withoutBacking ? 'with or without backing' : 'with backing only'}.`)
  if (r.pNumbers?.length) lines.push(`Base metals: ${r.pNumbers.join('; ')}.`)
  return lines
}
