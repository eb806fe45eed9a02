import { refuse } from '../refusal'

/** A P-No. as printed ("1", "5A", "15E", "unassigned"), normalised; "P-No. 1" and "p1" are accepted. */
export function pNo(text: string): string {
  const t = text.trim().toUpperCase().replace(/^P-?(NO\.?)?\s*/, '')
  if (t === 'UNASSIGNED' || /^\d{1,2}[A-Z]?$/.test(t)) return t
  return refuse(`pNumber: "${text}" is not a P-No. (for example 1, 5A, 8, 15E or unassigned)`)
}

/** QW-424.1 rows "P-No. X to P-No. X" that also qualify X to lower P-Nos. (from memory). */
const toLower: Record<string, string[]> = {
  '3': ['3', '1'],
  '4': ['4', '3', '1'],
  '5A': ['5A', '4', '3', '1'],
}

/** Dissimilar rows that qualify the higher P-No. to each of the lower ones (from memory). */
const dissimilar: [string, string[]][] = [
  ['5A', ['4', '3', '1']],
  ['4', ['3', '1']],
]

const samePair = (a: string, b: string, c: string, d: string) => (a === c && b === d) || (a === d && b === c)
const oneTo = (hi: string, los: string[], a: string, b: string) => (a === hi && los.includes(b)) || (b === hi && los.includes(a))

/**
 * Table QW-424.1 (from memory): whether the base metals of ONE PQR (A to B) qualify a WPS joint
 * (A to B). A dissimilar WPS joint is never qualified by joining two PQRs of each metal to itself:
 * each WPS pair needs one PQR row. Rows carried: same P-No. to itself → that P-No.; P-No. 3 to 3 →
 * 3 to 3 or 1; 4 to 4 → 4 to 4, 3 or 1; 5A to 5A → 5A to 5A, 4, 3 or 1; 5A to 4, 3 or 1 → 5A to
 * 4, 3 or 1; 4 to 3 or 1 → 4 to 3 or 1; 15E to 15E → 15E or 5B to 15E or 5B; P-No. X to Y → X to Y;
 * an unassigned metal only to what it was welded to.
 */
export function qw4241(pqrA: string, pqrB: string, wpsA: string, wpsB: string): boolean {
  const [pa, pb, wa, wb] = [pNo(pqrA), pNo(pqrB), pNo(wpsA), pNo(wpsB)]
  if (samePair(pa, pb, wa, wb)) return true
  if (pa === pb) {
    if (pa === '15E') return ['15E', '5B'].includes(wa) && ['15E', '5B'].includes(wb)
    const lower = toLower[pa]
    return lower !== undefined && oneTo(pa, lower, wa, wb)
  }
  for (const [hi, los] of dissimilar) {
    if (oneTo(hi, los, pa, pb)) return oneTo(hi, los, wa, wb)
  }
  return false
}
