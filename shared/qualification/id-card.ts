import type { WelderRangesResult } from '../rules/results'
import type { Unit } from '../rules/types'
import type { ProcessStanding } from './process-standing'
import { positionsInWords } from './plain-words'

// What a welder's ID card and its public page say: per process the welder is current in today, the positions and
// thickness of the latest certified test of that process in a few plain words, and the lapse date. Nothing else.

export interface CardTest {
  testDate: string
  processes: string[]
  unit: Unit
  /** The test's qualified ranges, or null when Rootface cannot compute them (then the card says "check by hand"). */
  ranges: WelderRangesResult | null
}

export interface CardLine {
  process: string
  positions: string
  thickness: string
  lapsesOn: string
  standing: 'current' | 'lapsing'
}

const len = (v: number, unit: Unit) => `${Number(v.toFixed(4))} ${unit}`

/** The positions qualified, groove and fillet, in a few words. */
export function cardPositions(r: WelderRangesResult): string {
  const parts: string[] = []
  const groove = [...new Set([...r.positions.groove, ...(r.positions.groovePipe ?? [])])]
  if (groove.length) parts.push(`groove ${positionsInWords(groove)}`)
  if (r.positions.fillet.length) parts.push(`fillet ${positionsInWords(r.positions.fillet)}`)
  return parts.length ? parts.join('; ') : 'cannot tell: check the test record'
}

/** The thickness qualified for one process, in a few words. */
export function cardThickness(r: WelderRangesResult, process: string, unit: Unit): string {
  const own = r.deposits?.find(d => d.process === process)
  const deposit = own ? own.depositMax : r.depositMax
  if (deposit === null) return 'weld metal: no upper limit'
  if (typeof deposit === 'number') return `weld metal up to ${len(deposit, unit)}`
  if (r.thickness && (r.thickness.min !== null || r.thickness.max !== null)) {
    const { min, max } = r.thickness
    if (min !== null && max !== null) return `base metal ${len(min, unit)} to ${len(max, unit)}`
    return min !== null ? `base metal from ${len(min, unit)}` : `base metal up to ${len(max!, unit)}`
  }
  return 'cannot tell: check the test record'
}

/**
 * One line per process that is current or lapsing today, from the latest certified test that deposited it. A lapsed
 * process is left off: the card shows what the welder may weld today, not what they once could.
 */
export function cardLines(standings: readonly ProcessStanding[], tests: readonly CardTest[]): CardLine[] {
  const lines: CardLine[] = []
  for (const s of standings) {
    if (s.standing === 'lapsed') continue
    const latest = [...tests].filter(t => t.processes.includes(s.process)).sort((a, b) => b.testDate.localeCompare(a.testDate))[0]
    const r = latest?.ranges ?? null
    lines.push({
      process: s.process,
      positions: r ? cardPositions(r) : 'cannot tell: check the test record',
      thickness: r && latest ? cardThickness(r, s.process, latest.unit) : 'cannot tell: check the test record',
      lapsesOn: s.lapsesOn,
      standing: s.standing,
    })
  }
  return lines.sort((a, b) => a.process.localeCompare(b.process))
}

/** The caution printed on the card and shown on its public page. */
export const cardCaution = 'Shows what Rootface recorded at the moment of reading. Check the current status on the page behind the QR code; '
  + 'the governing code edition, the shop\'s quality manual and the inspector have the final word.'
