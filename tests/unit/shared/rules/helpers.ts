// Helpers for the rule tests; each test beside them names its source (ASME BPVC IX, AWS D1.1/D1.3, ISO 9606-1 clause or table, or 'from memory').
import { expect } from 'vitest'
import { evaluate } from '../../../../shared/rules/index'
import type { EvaluationResult } from '../../../../shared/rules/index'

/** Evaluate a request that must succeed, and return its result. */
export function ok(request: unknown): EvaluationResult {
  const result = evaluate(request)
  if ('error' in result) throw new Error(`unexpected error: ${String(result.error)}`)
  return result
}

/** Evaluate a request that must be refused, and return its message. */
export function refused(request: unknown): string {
  const result = evaluate(request)
  expect(result).toHaveProperty('error')
  return String((result as { error: unknown }).error)
}
