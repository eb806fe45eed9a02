import { codeName } from '../caution'
import type { CoversInput, ProductionWeld, WelderTestInput } from '../inputs'
import type { CoverReason, CoversResult } from '../results'
import type { RuleContext } from '../types'
import { inRange, rangeText } from '../coverage'
import { coversEach } from '../covers-each'
import { productionLayers, productionPositions, testLayers } from '../layers'
import { refuse } from '../refusal'
import { categorical, reason, weldsVertical } from '../variables'
import { scopeText, withinD13Scope } from './scope'
import { d13Joint, welderRanges } from './welder-ranges'

const norm = (v: string) => v.trim().toLowerCase()

function one(test: WelderTestInput, production: ProductionWeld, context: RuleContext): CoverReason[] {
  const u = context.unit
  const reasons: CoverReason[] = []
  const push = (r: CoverReason | null) => {
    if (r) reasons.push(r)
  }
  const letters = productionPositions(production).map((p) => {
    const letter = p.toUpperCase().replace('OH', 'O')
    if (!['F', 'H', 'V', 'O'].includes(letter)) refuse(`production.position: "${p}" is not F, H, V or OH`)
    return letter
  })
  if (production.code !== undefined) {
    const same = production.code === 'aws-d1.3'
    reasons.push(reason(same ? 'met' : 'not-met', 'code', 'D1.3 4.7', same ? 'The joint is welded to AWS D1.3.' : `The joint is welded to ${codeName(production.code)}; an AWS D1.3 test does not qualify it.`, 'convention'))
  }
  if (production.thickness !== undefined && !withinD13Scope(production.thickness, u)) {
    reasons.push(reason('not-met', 'scope', 'D1.3 scope', scopeText(production.thickness, u), 'verified'))
    return reasons
  }
  if (production.form !== 'plate') reasons.push(reason('not-met', 'scope', 'D1.3 scope', 'AWS D1.3 covers sheet steel, not pipe.', 'verified'))
  const ranges = welderRanges(test, context)
  const testJoint = d13Joint(test)
  const joint = d13Joint(production)
  reasons.push(reason(joint === testJoint ? 'met' : 'not-met', 'joint', 'D1.3 4.7 (joint type)', joint === testJoint ? `Joint ${joint} was tested.` : `The test was ${testJoint}; ${joint} is a different joint type and needs its own test.`, 'verified'))

  const t = testLayers(test)[0]!
  const named = productionLayers(production)
  const p = named[0] ?? { ...production, process: t.process }
  if (named.length === 0) reasons.push(reason('not-recorded', 'process', 'D1.3 4.7 (process)', `Production does not name its process: cannot tell, state it; the test was ${t.process}.`, 'verified', { record: 'production.process' }))
  else {
    named.forEach((layer) => {
      const same = norm(layer.process) === norm(t.process)
      reasons.push(reason(same ? 'met' : 'not-met', 'process', 'D1.3 4.7 (process)', same ? `Process ${t.process} was tested.` : `The test was ${t.process}; ${layer.process} needs its own test.`, 'verified', { process: layer.process }))
    })
  }
  const qualified = production.weld === 'groove' ? ranges.positions.groove : ranges.positions.fillet
  const bad = letters.filter(l => !qualified.includes(l))
  reasons.push(reason(bad.length ? 'not-met' : 'met', 'position', 'D1.3 Table 4.4', `Position ${letters.map(l => (l === 'O' ? 'OH' : l)).join(', ')}: the test qualifies ${qualified.map(l => (l === 'O' ? 'OH' : l)).join(', ') || 'none for this weld type'}.`, 'verified'))
  if (production.thickness === undefined) {
    reasons.push(reason('not-recorded', 'thickness', 'D1.3 4.7.2', 'AWS D1.3 coverage depends on the sheet thickness: give it.', 'verified', { record: 'production.thickness' }))
  }
  else if (ranges.thickness) {
    const ok = inRange(production.thickness, ranges.thickness)
    reasons.push(reason(ok ? 'met' : 'not-met', 'thickness', 'D1.3 4.7.2', `Sheet ${production.thickness} ${u}: qualified ${rangeText(ranges.thickness, u)}.`, 'verified'))
  }
  if (norm(t.process) === 'smaw' || norm(p.process) === 'smaw') {
    push(categorical({ variable: 'f-number', clause: 'D1.3 4.7 (F-Number)', basis: 'partial', field: 'fNumber', test: t.fNumber, production: p.fNumber, qualifies: (a, b) => a === b, show: v => `F-No. ${v}` }))
  }
  push(categorical({ variable: 'coating', clause: 'D1.3 4.7 (coating)', basis: 'partial', field: 'coating', test: test.coating, production: production.coating, qualifies: (a, b) => norm(a) === norm(b), show: v => (norm(v) === 'none' ? 'uncoated' : `${v} coated`) }))
  if (weldsVertical(letters)) {
    push(categorical({ variable: 'progression', clause: 'D1.3 4.7 (vertical progression)', basis: 'verified', field: 'progression', test: t.progression, production: p.progression, qualifies: (a, b) => a === b, show: v => `${v} vertical` }))
  }
  return reasons
}

/** Does an AWS D1.3 welder test cover a production sheet weld? Thicker work is sent to D1.1. */
export function covers(input: CoversInput, context: RuleContext): CoversResult {
  return coversEach(input, (test, production) => one(test, production, context))
}
