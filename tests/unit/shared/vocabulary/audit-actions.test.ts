import { readdirSync, readFileSync } from 'node:fs'
import { join } from 'node:path'
import { describe, expect, it } from 'vitest'
import { actionIds, actionWords, recordTypeWords } from '../../../../shared/vocabulary/audit-actions'

// Issue 17: the History showed raw action ids ('procedure.approve', 'sign-out-everywhere'). Expected words are Rootface's
// own (common practice: a past-tense sentence a quality manager reads), not from a code.
describe('audit actions in plain words', () => {
  it('reads the stored ids as sentences', () => {
    expect(actionWords('procedure.approve')).toBe('Approved and signed')
    expect(actionWords('sign-out-everywhere')).toBe('Signed out on every device')
    expect(actionWords('import')).toBe('Imported from a CSV file')
    expect(actionWords('import-undo')).toBe('CSV import undone')
    expect(actionWords('signoff.withdrawn')).toBe('Sign-off request withdrawn')
  })
  it('an action not in the list still reads as words, never as the raw id', () => {
    expect(actionWords('weld-log.create')).toBe('Weld log added')
    expect(actionWords('calibration.restore')).toBe('Calibration restored')
    expect(actionWords('archive')).toBe('Archive')
    expect(actionWords('operatorCard.issue')).toBe('Operator card issue')
  })
  it('names the kind of record in the words of the record vocabulary', () => {
    expect(recordTypeWords('welder-test')).toBe('welder test (WPQ)')
    expect(recordTypeWords('procedure')).toBe('WPS')
    expect(recordTypeWords('filler-metal')).toBe('filler metal')
  })
})

describe('every action the server writes has its words', () => {
  // The literal action ids of the recordAudit calls under server/ (both sides of a ternary; `signoff.${status}` is listed by hand).
  const root = join(__dirname, '../../../../server')
  const sources = (readdirSync(root, { recursive: true }) as string[]).filter(f => /\.ts$/.test(f) && !f.includes('migrations'))
  const written = new Set<string>(['signoff.done', 'signoff.withdrawn'])
  for (const file of sources) {
    for (const call of readFileSync(join(root, file), 'utf8').split('recordAudit(').slice(1)) {
      const action = /action: ([^,}]*)[,}]/.exec(call.slice(0, 400))
      // The ids of the action, not the values a ternary compares against ("purpose === 'invitation' ? ...").
      for (const id of action?.[1]?.matchAll(/(?<!=== )'([a-z][a-z.-]*)'/g) ?? []) written.add(id[1]!)
    }
  }
  it('finds the server\'s actions and has a sentence for each', () => {
    expect(written.size).toBeGreaterThan(30)
    expect([...written].filter(id => !actionIds.includes(id))).toEqual([])
  })
})
