import type { FNumbersQualified } from '../results'
import { refuse } from '../refusal'
import { atMost } from './editions'

/**
 * QW-433 alternate F-Numbers for welders (from memory; the groups from F6 up were seen on an
 * older-edition page with F21–F25 and F34/F41–F45; current editions are remembered as F21–F26
 * and F34/F41–F46). QW-402.4: a test without backing qualifies with and without backing; a test
 * with backing qualifies with backing only.
 */
function group(f: number, edition: string): number[] {
  const range = (low: number, high: number) => Array.from({ length: high - low + 1 }, (_, i) => low + i)
  const old = atMost(edition, 2013)
  if (f >= 1 && f <= 4) return range(1, f) // F1–F4: that F-No. and every lower one
  if (f === 5) return [5]
  if (f === 6) return [6] // any F6 qualifies all F6
  const f2x = old ? range(21, 25) : range(21, 26)
  if (f2x.includes(f)) return f2x
  if ([31, 32, 33, 35, 36, 37].includes(f)) return [f]
  const f4x = old ? [34, ...range(41, 45)] : [34, ...range(41, 46)]
  if (f4x.includes(f)) return f4x
  if (f >= 51 && f <= 55) return range(51, 55)
  if (f === 61) return [61]
  if (f === 71 || f === 72) return [f]
  return refuse(`fNumber: F-No. ${f} is in no QW-433 group carried for the ${edition} edition`)
}

export function qw433(fNumber: number, backing: boolean, edition: string): FNumbersQualified {
  return { numbers: group(fNumber, edition), withBacking: true, withoutBacking: !backing }
}
