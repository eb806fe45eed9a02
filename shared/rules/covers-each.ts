import type { CoversInput, ProductionWeld, WelderTestInput } from './inputs'
import type { CoverReason, CoversResult } from './results'
import { answerOf, recordOf, undeterminedOf } from './variables'

/**
 * A set of tests covers a production weld when one of them covers it all (every variable compared
 * and met). When none does, the answer is "cannot tell" if one of them has nothing unmet but a
 * variable not recorded (its fields are listed under record), otherwise "not covered".
 */
export function coversEach(
  input: CoversInput,
  one: (test: WelderTestInput, production: ProductionWeld) => CoverReason[],
): CoversResult {
  const tests = Array.isArray(input.test) ? input.test : [input.test]
  const results = tests.map(test => one(test, input.production))
  const answers = results.map(answerOf)
  const done = (reasons: CoverReason[], answer: CoversResult['answer']): CoversResult =>
    ({ covered: answer === 'covered', answer, record: answer === 'cannot-tell' ? recordOf(reasons) : [], reasons, undetermined: answer === 'cannot-tell' ? undeterminedOf(reasons) : [] })
  const covering = answers.indexOf('covered')
  if (covering >= 0) return done(results[covering] ?? [], 'covered')
  const telling = answers.indexOf('cannot-tell')
  if (results.length === 1) return done(results[0] ?? [], answers[0] ?? 'not-covered')
  const named = results.flatMap((reasons, i) => reasons.map(r => ({ ...r, text: `Test ${i + 1}: ${r.text}` })))
  if (telling >= 0) {
    const r = done(results[telling] ?? [], 'cannot-tell')
    return { ...r, reasons: named }
  }
  return done(named, 'not-covered')
}
