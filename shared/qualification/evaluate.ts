import { evaluate } from '../rules'
import type { CheckName, CodeId, Unit } from '../rules/types'

/** One rules request whose failure is a bug in the caller, not a user error: it throws with the rule's message. */
export function mustEvaluate<T>(code: CodeId, check: CheckName, unit: Unit, edition: string | undefined, input: object): T {
  const result = evaluate({ code, check, unit, edition, input }) as T | { error: string }
  if (result && typeof result === 'object' && 'error' in result) throw new Error(`${code} ${check}: ${result.error}`)
  return result as T
}
