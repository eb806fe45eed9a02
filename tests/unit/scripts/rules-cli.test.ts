import { spawnSync } from 'node:child_process'
import { fileURLToPath } from 'node:url'
import { describe, expect, it } from 'vitest'

const root = fileURLToPath(new URL('../../../', import.meta.url))
const tsx = fileURLToPath(new URL('../../../node_modules/.bin/tsx', import.meta.url))

function run(stdin: string): { status: number | null, stdout: string, stderr: string, json: unknown } {
  const child = spawnSync(tsx, ['scripts/rules.ts'], { cwd: root, input: stdin, encoding: 'utf8', timeout: 30_000 })
  return { status: child.status, stdout: child.stdout, stderr: child.stderr, json: JSON.parse(child.stdout) }
}

describe('scripts/rules.ts (npm run --silent rules)', () => {
  it('acceptance: ASME QW-322.1(a) continuity, last use 2026-01-15 → lapses on 2026-07-15', () => {
    const out = run('{"code":"asme-ix","check":"continuity","unit":"in","input":{"lastUse":"2026-01-15","on":"2026-07-15"}}')
    expect(out.status).toBe(0)
    expect(out.stdout.startsWith('{"lapsesOn":"2026-07-15","current":false,')).toBe(true)
  }, 30_000)

  it('an array gives an array in the same order, with errors in place of bad requests', () => {
    const out = run(JSON.stringify([
      { code: 'aws-d1.1', check: 'continuity', unit: 'in', input: { lastUse: '2026-01-15', on: '2026-07-15' } },
      { code: 'asme-ix', check: 'no-such-check', unit: 'in', input: {} },
      { code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW', couponThickness: 1 } },
      { code: 'asme-ix', check: 'procedure-ranges', unit: 'in', input: { process: 'SMAW' } },
      { code: 'asme-ix', check: 'gauge', unit: 'in', input: { gauge: 10, material: 'aluminium' } },
    ]))
    expect(out.status).toBe(0)
    const results = out.json as Record<string, unknown>[]
    expect(results).toHaveLength(5)
    expect(results[0]).toMatchObject({ lapsesOn: '2026-07-16', current: true })
    expect(results[1]).toEqual({ error: expect.stringContaining('check must be one of') })
    expect(results[2]).toMatchObject({ baseMetal: { min: 0.1875, max: 2 } })
    expect(results[3]).toEqual({ error: expect.stringContaining('input.couponThickness') })
    expect(results[4]).toEqual({ error: expect.stringContaining('sheet steel') })
  }, 30_000)

  it('malformed JSON and empty input give an error object, never a stack trace', () => {
    for (const input of ['{"code":', '', 'not json']) {
      const out = run(input)
      expect(out.status).toBe(0)
      expect(out.json).toEqual({ error: expect.any(String) })
      expect(out.stdout).not.toContain('    at ')
      expect(out.stderr).toBe('')
    }
  }, 60_000)

  it('the fields added for several processes and positions: answer, record and undetermined come back (ASME IX QW-405.3, QW-452.1(b), QW-424.1: see the rule tests)', () => {
    const spray = { process: 'GMAW', transfer: 'spray', form: 'plate', weld: 'groove', testPositions: ['3G'], couponThickness: 1, progression: 'uphill' }
    const out = run(JSON.stringify([
      { code: 'asme-ix', check: 'covers', unit: 'in', input: { test: spray, production: { form: 'plate', weld: 'groove', positions: ['F', 'V'], process: 'GMAW', transfer: 'spray', progression: 'downhill', thickness: 1 } } },
      { code: 'asme-ix', check: 'covers', unit: 'in', input: { test: { ...spray, progression: undefined }, production: { form: 'plate', weld: 'groove', positions: ['F', 'V'], process: 'GMAW', transfer: 'spray', progression: 'uphill', thickness: 1 } } },
      { code: 'asme-ix', check: 'welder-ranges', unit: 'in', input: { process: 'SMAW', form: 'plate', weld: 'groove', testPositions: ['3G'] } },
      { code: 'asme-ix', check: 'wps-support', unit: 'in', input: { wps: { thickness: { min: 0.1875, max: 2 }, baseMetals: { a: { pNumber: '1' }, b: { pNumber: '8' } }, layers: [{ process: 'SMAW' }] }, pqrs: [{ process: 'SMAW', couponThickness: 1, baseMetals: { a: { pNumber: '1' } } }, { process: 'SMAW', couponThickness: 1, baseMetals: { a: { pNumber: '8' } } }] } },
      { code: 'asme-ix', check: 'covers', unit: 'in', input: { test: spray, production: { form: 'plate', weld: 'groove', position: 'F', progression: 'sideways' } } },
    ]))
    const [downhill, unrecorded, ranges, support, bad] = out.json as Record<string, unknown>[]
    expect(downhill).toMatchObject({ covered: false, answer: 'not-covered' })
    expect(unrecorded).toMatchObject({ covered: false, answer: 'cannot-tell', record: ['test.progression'] })
    expect(ranges).toMatchObject({ positions: { groove: ['F', 'V'] }, undetermined: [{ field: 'depositThickness' }] })
    expect(support).toMatchObject({ supported: false, answer: 'not-supported' })
    expect(bad).toEqual({ error: expect.stringContaining('progression must be') })
  }, 30_000)
})
