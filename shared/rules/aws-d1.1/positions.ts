import type { Form, WeldType } from '../types'
import { refuse } from '../refusal'

type Letter = 'F' | 'H' | 'V' | 'O'
const order: Letter[] = ['F', 'H', 'V', 'O']
const all: Letter[] = ['F', 'H', 'V', 'O']

interface Row { groove: Letter[], fillet: Letter[], fromMemory: boolean }
const row = (groove: Letter[], fillet: Letter[], fromMemory = false): Row => ({ groove, fillet, fromMemory })

/**
 * AWS D1.1:2020 Table 6.10 (plate, read; groove CJP and PJP columns are the same for these rows),
 * Table 10.12 (pipe: fillet 4F and 5F read; pipe groove rows from memory, and the fillets a pipe
 * groove test qualifies are given as its groove positions only, the least this module can vouch for).
 */
const table: Record<string, Record<string, Row>> = {
  'plate-groove': {
    '1G': row(['F'], ['F', 'H']),
    '2G': row(['F', 'H'], ['F', 'H']),
    '3G': row(['F', 'H', 'V'], ['F', 'H', 'V']),
    '4G': row(['F', 'O'], ['F', 'H', 'O']),
  },
  'plate-fillet': {
    '1F': row([], ['F']),
    '2F': row([], ['F', 'H']),
    '3F': row([], ['F', 'H', 'V']),
    '4F': row([], ['F', 'H', 'O']),
  },
  'pipe-groove': {
    '1G': row(['F'], ['F'], true),
    '2G': row(['F', 'H'], ['F', 'H'], true),
    '5G': row(['F', 'V', 'O'], ['F', 'V', 'O'], true),
    '6G': row(all, all, true),
    // 6GR: 6G with a restriction ring (T-, Y- and K-connections); all positions, from memory.
    '6GR': row(all, all, true),
  },
  'pipe-fillet': {
    '1F': row([], ['F'], true),
    '2F': row([], ['F', 'H'], true),
    '4F': row([], ['F', 'H', 'O']),
    '5F': row([], all),
  },
}

/** Union of the single-test rows; the combined rows (3G + 4G, 3F + 4F, 2G + 5G) equal that union. */
export function d11Positions(form: Form, weld: WeldType, tests: string[]): { groove: Letter[], fillet: Letter[], fromMemory: boolean } {
  const rows = table[`${form}-${weld}`]
  if (!rows) refuse(`AWS D1.1 carries no ${form} ${weld} position rows`)
  if (tests.length === 0) refuse('testPositions: give at least one test position')
  const groove = new Set<Letter>()
  const fillet = new Set<Letter>()
  let fromMemory = false
  for (const test of tests) {
    const found = rows[test.toUpperCase()]
    if (!found) refuse(`testPositions: ${test} is not a ${form} ${weld} test position carried for AWS D1.1 (${Object.keys(rows).join(', ')})`)
    found.groove.forEach(p => groove.add(p))
    found.fillet.forEach(p => fillet.add(p))
    fromMemory ||= found.fromMemory
  }
  return { groove: order.filter(p => groove.has(p)), fillet: order.filter(p => fillet.has(p)), fromMemory }
}

/** D1.1 prints overhead as OH. */
export function d11Letters(letters: readonly string[]): string {
  if (letters.length === 0) return 'none'
  if (order.every(p => letters.includes(p))) return 'all positions'
  return letters.map(p => (p === 'O' ? 'OH' : p)).join(', ')
}
