import { refuse } from '../refusal'

/** ISO 6947 positions in a fixed order for results. */
export const isoOrder = ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045'] as const

/** ISO 9606-1:2012 Table 9, butt welds (read on a summary sheet of DIN EN ISO 9606-1:2013). */
const butt: Record<string, string[]> = {
  'PA': ['PA'],
  'PC': ['PA', 'PC'],
  'PE': ['PA', 'PC', 'PE'],
  'PF': ['PA', 'PF'],
  'PG': ['PG'],
  'PH': ['PA', 'PE', 'PF', 'PH'],
  'PJ': ['PA', 'PE', 'PG', 'PJ'],
  'H-L045': ['PA', 'PC', 'PE', 'PF', 'PH', 'H-L045'],
  'J-L045': ['PA', 'PC', 'PE', 'PG', 'PJ', 'J-L045'],
}

/** Table 10, fillet welds: PA and PB read on summary sheets; PD, PF, PG, PH and PJ from memory. */
const fillet: Record<string, { positions: string[], fromMemory: boolean }> = {
  PA: { positions: ['PA'], fromMemory: false },
  PB: { positions: ['PA', 'PB'], fromMemory: false },
  PD: { positions: ['PA', 'PB', 'PC', 'PD', 'PE'], fromMemory: true },
  PF: { positions: ['PA', 'PB', 'PF'], fromMemory: true },
  PG: { positions: ['PG'], fromMemory: true },
  PH: { positions: ['PA', 'PB', 'PD', 'PF', 'PH'], fromMemory: true },
  PJ: { positions: ['PA', 'PB', 'PD', 'PG', 'PJ'], fromMemory: true },
}

function ordered(set: Set<string>): string[] {
  return isoOrder.filter(p => set.has(p))
}

/** Union of the rows; on pipe, PC with PH adds H-L045 and PC with PJ adds J-L045 (summary sheet). */
export function buttPositions(tests: string[], pipe: boolean): string[] {
  if (tests.length === 0) refuse('testPositions: give at least one test position')
  const set = new Set<string>()
  const upper = tests.map(t => t.toUpperCase())
  for (const test of upper) {
    const row = butt[test]
    if (!row) refuse(`testPositions: ${test} is not a butt-weld test position of ISO 9606-1 Table 9 (${Object.keys(butt).join(', ')})`)
    row.forEach(p => set.add(p))
  }
  if (pipe && upper.includes('PC') && upper.includes('PH')) butt['H-L045']?.forEach(p => set.add(p))
  if (pipe && upper.includes('PC') && upper.includes('PJ')) butt['J-L045']?.forEach(p => set.add(p))
  return ordered(set)
}

export function filletPositions(tests: string[]): { positions: string[], fromMemory: boolean } {
  if (tests.length === 0) refuse('testPositions: give at least one test position')
  const set = new Set<string>()
  let fromMemory = false
  for (const test of tests.map(t => t.toUpperCase())) {
    const row = fillet[test]
    if (!row) refuse(`testPositions: ${test} is not a fillet test position carried for ISO 9606-1 Table 10 (${Object.keys(fillet).join(', ')})`)
    row.positions.forEach(p => set.add(p))
    fromMemory ||= row.fromMemory
  }
  return { positions: ordered(set), fromMemory }
}
