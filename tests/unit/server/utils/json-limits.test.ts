import { describe, expect, it } from 'vitest'
import { jsonBodyProblem, jsonTooDeep, MAX_JSON_DEPTH } from '../../../../server/utils/json-limits'

describe('JSON body limits', () => {
  it('counts nesting of arrays and objects, not brackets inside strings', () => {
    expect(jsonTooDeep('['.repeat(MAX_JSON_DEPTH) + ']'.repeat(MAX_JSON_DEPTH))).toBe(false)
    expect(jsonTooDeep('['.repeat(MAX_JSON_DEPTH + 1) + ']'.repeat(MAX_JSON_DEPTH + 1))).toBe(true)
    expect(jsonTooDeep(JSON.stringify({ note: '['.repeat(1000) }))).toBe(false)
    expect(jsonTooDeep(JSON.stringify({ note: '\\"[[[' }))).toBe(false)
  })

  it('a body nested 400,000 deep is refused in one pass, without parsing it', () => {
    const deep = '['.repeat(400_000) + ']'.repeat(400_000)
    const started = performance.now()
    const problem = jsonBodyProblem(deep)
    expect(performance.now() - started).toBeLessThan(200)
    expect(problem?.message).toContain(`deeper than ${MAX_JSON_DEPTH}`)
  })

  it('names the field holding a lone surrogate; paired surrogates and plain text pass', () => {
    const problem = jsonBodyProblem('{"name":"ok","variables":{"note":"A\\ud800B"}}')
    expect(problem?.data.fieldErrors).toEqual({ 'variables.note': [expect.stringContaining('broken character')] })
    expect(jsonBodyProblem('{"name":"\\ud83d\\udd25"}')).toBeNull()
    expect(jsonBodyProblem('{"name":"plain"}')).toBeNull()
  })
})
