import type { Basis } from '../types'
import { refuse } from '../refusal'
import { atMost } from './editions'

interface PGroup {
  label: string
  contains: (num: number, suffix: string) => boolean
}

const between = (low: number, high: number) => (num: number) => num >= low && num <= high

/** QW-423.1 from the 2015 edition on (read in the 2015 and 2023 editions). */
const current: PGroup[] = [
  {
    label: 'P-No. 1 through P-No. 15F, P-No. 34, P-No. 41 through P-No. 49',
    contains: (num, suffix) => (num >= 1 && num < 15) || (num === 15 && suffix <= 'F') || num === 34 || between(41, 49)(num),
  },
  { label: 'P-No. 21 through P-No. 26', contains: between(21, 26) },
  { label: 'P-No. 51 through P-No. 53, P-No. 61, P-No. 62', contains: num => between(51, 53)(num) || num === 61 || num === 62 },
]

/** QW-423.1 before 2015 (older edition, read in a training copy). */
const older: PGroup[] = [
  { label: 'P-No. 1 through P-No. 11, P-No. 34, P-No. 41 through P-No. 47', contains: num => between(1, 11)(num) || num === 34 || between(41, 47)(num) },
  { label: 'P-No. 21 through P-No. 25', contains: between(21, 25) },
  { label: 'P-No. 51 through P-No. 53, P-No. 61, P-No. 62', contains: num => between(51, 53)(num) || num === 61 || num === 62 },
]

export interface PNumbersQualified {
  groups: string[]
  clause: string
  basis: Basis
  contains: (pNumber: string) => boolean
}

function parse(pNumber: string): { num: number, suffix: string } | 'unassigned' {
  const text = pNumber.trim().toUpperCase().replace(/^P-?(NO\.?)?\s*/, '')
  if (text === 'UNASSIGNED') return 'unassigned'
  const match = /^(\d+)([A-Z]?)$/.exec(text)
  if (!match) refuse(`pNumber: "${pNumber}" is not a P-Number (for example 1, 8, 15E, 43 or unassigned)`)
  return { num: Number(match[1]), suffix: match[2] ?? '' }
}

/** QW-423.1: the base metals a welder's test coupon qualifies, keyed by edition (rows changed in 2015). */
export function qw4231(pNumber: string, edition: string): PNumbersQualified {
  const parsed = parse(pNumber)
  const clause = 'QW-423.1'
  if (parsed === 'unassigned') {
    return { groups: ['the same unassigned metal only'], clause, basis: 'verified', contains: () => false }
  }
  const groups = atMost(edition, 2013) ? older : current
  const group = groups.find(g => g.contains(parsed.num, parsed.suffix))
  if (!group) refuse(`pNumber: P-No. ${pNumber} is in no QW-423.1 row of the ${edition} edition; qualify on that metal itself`)
  return {
    groups: [group.label],
    clause,
    basis: 'verified',
    contains: (other: string) => {
      const p = parse(other)
      return p !== 'unassigned' && group.contains(p.num, p.suffix)
    },
  }
}
