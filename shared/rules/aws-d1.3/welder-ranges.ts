import type { D13Joint, WelderTestInput } from '../inputs'
import type { WelderRangesResult } from '../results'
import type { Reason, RuleContext } from '../types'
import { refuse } from '../refusal'
import { formatRange, fromMicro, pick, scale, toMicro } from '../units'
import { d13ScopeMax, scopeText, withinD13Scope } from './scope'

type Letter = 'F' | 'H' | 'V' | 'O'

/**
 * AWS D1.3 Table 4.4: square- or flare-groove and fillet/plug tests 1G/1F → F, 2G/2F → F, H,
 * 3G/3F → F, H, V, 4G/4F → F, H, OH; arc spot and arc seam tests 1F → F, 2F → H (arc seam only).
 */
const sheetRows: Record<string, Letter[]> = {
  1: ['F'], 2: ['F', 'H'], 3: ['F', 'H', 'V'], 4: ['F', 'H', 'O'],
}
const order: Letter[] = ['F', 'H', 'V', 'O']

export function d13Joint(input: { weld: string, joint?: D13Joint }): D13Joint {
  if (input.joint) {
    const grooveJoint = input.joint === 'square-groove' || input.joint === 'flare-groove'
    if (grooveJoint !== (input.weld === 'groove')) refuse(`joint: ${input.joint} does not match weld "${input.weld}"`)
    return input.joint
  }
  if (input.weld === 'fillet') return 'fillet'
  return refuse('joint: AWS D1.3 groove tests are square-groove or flare-groove: give joint')
}

function positions(joint: D13Joint, tests: string[]): Letter[] {
  if (tests.length === 0) refuse('testPositions: give at least one test position')
  const set = new Set<Letter>()
  for (const test of tests) {
    const match = /^([1-4])([GF])$/.exec(test.toUpperCase())
    const groove = joint === 'square-groove' || joint === 'flare-groove'
    if (!match || (groove ? match[2] !== 'G' : match[2] !== 'F')) refuse(`testPositions: ${test} is not a ${joint} test position of AWS D1.3 Table 4.4`)
    const n = match[1] ?? ''
    if (joint === 'arc-spot' || joint === 'arc-seam') {
      if (n === '1') set.add('F')
      else if (n === '2' && joint === 'arc-seam') set.add('H')
      else refuse(`testPositions: Table 4.4 gives ${joint} tests in ${joint === 'arc-seam' ? '1F and 2F' : '1F'} only`)
    }
    else {
      (sheetRows[n] ?? []).forEach(p => set.add(p))
    }
  }
  return order.filter(p => set.has(p))
}

/** What an AWS D1.3 (sheet steel) welder test qualifies: thickness 4.7.2, positions Table 4.4. */
export function welderRanges(input: WelderTestInput, context: RuleContext): WelderRangesResult {
  const u = context.unit
  if (input.form !== 'plate') refuse('form: AWS D1.3 qualifies welders on sheet ("plate"), not pipe')
  if (input.couponThickness === undefined) refuse('couponThickness: AWS D1.3 qualifies by the sheet thickness tested (4.7.2)')
  if (!withinD13Scope(input.couponThickness, u)) refuse(scopeText(input.couponThickness, u))
  const joint = d13Joint(input)
  const t = toMicro(input.couponThickness)
  const cap = pick(d13ScopeMax, u)
  const reasons: Reason[] = []
  let min: number
  let max: number
  if (joint === 'square-groove') {
    min = scale(t, 1, 2)
    max = Math.min(2 * t, cap)
    reasons.push({ clause: 'D1.3 4.7.2', text: `Square-groove test on ${input.couponThickness} ${u}: 0.5t to 2t${2 * t > cap ? ', held to the D1.3 scope limit' : ''} = ${formatRange(min, max, u)}.`, basis: 'verified' })
  }
  else if (joint === 'flare-groove' || joint === 'fillet') {
    min = t
    max = cap
    reasons.push({ clause: 'D1.3 4.7.2', text: `${joint} tests are made on the thinnest production sheet: ${formatRange(min, max, u)} (the upper limit is the D1.3 scope).`, basis: 'verified' })
  }
  else if (joint === 'arc-spot' || joint === 'arc-seam') {
    min = t
    max = t
    reasons.push({ clause: 'D1.3 4.7.2', text: `${joint} welds: each gauge used in production is tested; this test covers ${input.couponThickness} ${u} only.`, basis: 'verified' })
  }
  else {
    return refuse('joint: the thickness rule for plug-weld tests is not carried; 4.7.2 names arc spot, arc seam, flare-groove, fillet and square-groove welds')
  }
  const qualified = positions(joint, input.testPositions)
  reasons.push({ clause: 'D1.3 Table 4.4', text: `${joint} test in ${input.testPositions.join(' + ')}: ${qualified.map(p => (p === 'O' ? 'OH' : p)).join(', ')}.`, basis: 'verified' })
  reasons.push({ clause: 'D1.3 4.7', text: 'Two test assemblies are required for each joint type. Essential variables also include F-Number (SMAW), joint type, process, coating and vertical progression.', basis: 'verified' })
  const groove = joint === 'square-groove' || joint === 'flare-groove'
  return {
    thickness: { min: fromMicro(min), max: fromMicro(max) },
    positions: { groove: groove ? qualified : [], fillet: groove ? [] : qualified },
    reasons,
  }
}
