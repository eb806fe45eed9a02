import type { SpecimenSetInput } from './inputs'
import type { SpecimenCountSet, SpecimenSetResult, Undetermined } from './results'
import type { Reason } from './types'

const kinds = ['face', 'root', 'side', 'macro', 'fracture'] as const

export function countSpecimens(specimens: SpecimenSetInput['specimens']): Record<string, number> {
  const given: Record<string, number> = {}
  for (const s of specimens) given[s.type] = (given[s.type] ?? 0) + 1
  return given
}

export function describeSet(set: SpecimenCountSet): string {
  return kinds.filter(k => (set[k] ?? 0) > 0).map(k => `${set[k]} ${k}`).join(' + ')
}

/** What is missing from `given` to reach `set`. */
function missingFor(set: SpecimenCountSet, given: Record<string, number>): string[] {
  return kinds.filter(k => (given[k] ?? 0) < (set[k] ?? 0)).map(k => `${(set[k] ?? 0) - (given[k] ?? 0)} ${k}`)
}

/**
 * Complete when the specimens given reach one of the sets the table allows (every type of that set
 * in at least its number); incomplete otherwise, with what is missing for the nearest set.
 */
export function matchSpecimens(allowed: SpecimenCountSet[], specimens: SpecimenSetInput['specimens'], reasons: Reason[]): SpecimenSetResult {
  const given = countSpecimens(specimens)
  const gaps = allowed.map(set => missingFor(set, given))
  const index = gaps.findIndex(g => g.length === 0)
  const size = (g: string[]) => g.reduce((n, text) => n + Number.parseInt(text, 10), 0)
  const nearest = gaps.reduce((best, g) => (size(g) < size(best) ? g : best), gaps[0] ?? [])
  const complete = index >= 0
  reasons.push({
    clause: reasons[0]?.clause ?? 'specimens',
    text: complete
      ? `The specimens (${describeSet(given as SpecimenCountSet) || 'none'}) make the set ${describeSet(allowed[index]!)}.`
      : `Incomplete: the table asks for ${allowed.map(describeSet).join(', or ')}; given ${describeSet(given as SpecimenCountSet) || 'none'} (missing ${nearest.join(', ')}).`,
    basis: reasons[0]?.basis ?? 'memory',
  })
  return { answer: complete ? 'complete' : 'incomplete', complete, allowed, given, missing: complete ? [] : nearest, undetermined: [], reasons }
}

export function specimensUndetermined(undetermined: Undetermined[], reasons: Reason[], given: Record<string, number>): SpecimenSetResult {
  return { answer: 'cannot-tell', complete: false, allowed: [], given, missing: [], undetermined, reasons }
}
