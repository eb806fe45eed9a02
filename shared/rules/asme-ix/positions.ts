import type { Form, WeldType } from '../types'
import { refuse } from '../refusal'

/** Production positions of QW-461.9: flat, horizontal, vertical, overhead. */
export type Letter = 'F' | 'H' | 'V' | 'O'
export const allLetters: readonly Letter[] = ['F', 'H', 'V', 'O']

interface Row {
  /** (A) groove on plate, and on pipe over 24 in (610 mm) OD */
  a: Letter[]
  /** (B) groove on pipe of 24 in OD or less */
  b: Letter[]
  /** (C) fillet on plate and pipe */
  c: Letter[]
  /** Footnote †: limited to pipe of 2-7/8 in (73 mm) OD and over (column B for plate grooves, C for plate fillets). */
  daggerB: boolean
  daggerC: boolean
  fromMemory: boolean
}

const all: Letter[] = ['F', 'H', 'V', 'O']
const row = (a: Letter[], b: Letter[], c: Letter[], daggerB: boolean, daggerC: boolean, fromMemory = false): Row =>
  ({ a, b, c, daggerB, daggerC, fromMemory })

/** ASME BPVC IX Table QW-461.9 (about 2010 edition, single test rows). */
const table: Record<string, Record<string, Row>> = {
  'plate-groove': {
    '1G': row(['F'], ['F'], ['F'], true, false),
    '2G': row(['F', 'H'], ['F', 'H'], ['F', 'H'], true, false),
    '3G': row(['F', 'V'], ['F'], ['F', 'H', 'V'], true, false),
    '4G': row(['F', 'O'], ['F'], ['F', 'H', 'O'], true, false),
  },
  'pipe-groove': {
    '1G': row(['F'], ['F'], ['F'], false, false),
    '2G': row(['F', 'H'], ['F', 'H'], ['F', 'H'], false, false),
    '5G': row(['F', 'V', 'O'], ['F', 'V', 'O'], all, false, false),
    '6G': row(all, all, all, false, false),
  },
  'plate-fillet': {
    '1F': row([], [], ['F'], false, true),
    '2F': row([], [], ['F', 'H'], false, true),
    '3F': row([], [], ['F', 'H', 'V'], false, true),
    '4F': row([], [], ['F', 'H', 'O'], false, true),
  },
  // Pipe fillet rows: from memory (no public copy seen).
  'pipe-fillet': {
    '1F': row([], [], ['F'], false, false, true),
    '2F': row([], [], ['F', 'H'], false, false, true),
    '2FR': row([], [], ['F', 'H'], false, false, true),
    '4F': row([], [], ['F', 'H', 'O'], false, false, true),
    '5F': row([], [], all, false, false, true),
  },
}

export interface AsmePositions {
  groove: Letter[]
  groovePipe: Letter[]
  fillet: Letter[]
  /** † applies to column B (plate groove tests) */
  groovePipeDagger: boolean
  /** † applies to column C (plate fillet tests) */
  filletPipeDagger: boolean
  fromMemory: boolean
}

function sorted(set: Set<Letter>): Letter[] {
  return allLetters.filter(letter => set.has(letter))
}

export function testPositionsAllowed(form: Form, weld: WeldType): string[] {
  return Object.keys(table[`${form}-${weld}`] ?? {})
}

/**
 * Positions qualified by one or more test positions: the union of the single-test rows.
 * The combination rows of QW-461.9 (plate 3G+4G, 2G+3G+4G, 3F+4F; pipe 2G+5G) equal that union.
 */
export function qw4619(form: Form, weld: WeldType, tests: string[]): AsmePositions {
  const rows = table[`${form}-${weld}`]
  if (!rows) refuse(`QW-461.9 has no ${form} ${weld} rows`)
  if (tests.length === 0) refuse('testPositions: give at least one test position')
  const a = new Set<Letter>()
  const b = new Set<Letter>()
  const c = new Set<Letter>()
  let fromMemory = false
  for (const test of tests) {
    const found = rows[test.toUpperCase()]
    if (!found) refuse(`testPositions: ${test} is not a ${form} ${weld} test position in QW-461.9 (${Object.keys(rows).join(', ')})`)
    found.a.forEach(p => a.add(p))
    found.b.forEach(p => b.add(p))
    found.c.forEach(p => c.add(p))
    fromMemory ||= found.fromMemory
  }
  return {
    groove: sorted(a),
    groovePipe: sorted(b),
    fillet: sorted(c),
    groovePipeDagger: form === 'plate' && weld === 'groove',
    filletPipeDagger: form === 'plate' && weld === 'fillet',
    fromMemory,
  }
}

export function describeLetters(letters: readonly string[]): string {
  if (letters.length === 0) return 'none'
  if (allLetters.every(letter => letters.includes(letter))) return 'all positions (F, H, V, O)'
  return letters.join(', ')
}
