import type { RuleSet } from './rule-set'
import type { CheckName, CodeId, ErrorResult, ResultMeta, RuleContext } from './types'
import { asmeIx } from './asme-ix'
import { awsD11 } from './aws-d1.1'
import { awsD13 } from './aws-d1.3'
import { cautionText } from './caution'
import { iso96061 } from './iso-9606-1'
import { evaluateIso15614 } from './iso-15614-1'
import { RuleRefusal } from './refusal'
import { envelopeSchema, formatIssues, inputSchemas } from './requests'

export type { RuleSet } from './rule-set'
export type * from './types'
export type * from './inputs'
export type * from './results'
export { cautionText } from './caution'
export { RuleRefusal } from './refusal'

const ruleSets: Record<CodeId, RuleSet> = {
  'asme-ix': asmeIx,
  'aws-d1.1': awsD11,
  'aws-d1.3': awsD13,
  'iso-9606-1': iso96061,
}

export function getRuleSet(code: CodeId): RuleSet {
  return ruleSets[code]
}

export const codes = Object.keys(ruleSets) as CodeId[]

type Evaluated = Record<string, unknown> & { reasons: unknown[] }

function run(ruleSet: RuleSet, check: CheckName, input: unknown, context: RuleContext): Evaluated | string {
  // Each branch re-parses with its own schema, so the rule receives exactly its input type.
  switch (check) {
    case 'procedure-ranges': return ruleSet.procedureRanges ? { ...ruleSet.procedureRanges(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
    case 'wps-support': return ruleSet.wpsSupport ? { ...ruleSet.wpsSupport(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
    case 'welder-ranges': return { ...ruleSet.welderRanges(inputSchemas[check].parse(input), context) }
    case 'covers': return { ...ruleSet.covers(inputSchemas[check].parse(input), context) }
    case 'bend': return ruleSet.bend ? { ...ruleSet.bend(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
    case 'radiography': return ruleSet.radiography ? { ...ruleSet.radiography(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
    case 'continuity': return { ...ruleSet.continuity(inputSchemas[check].parse(input), context) }
    case 'heat-input': return { ...ruleSet.heatInput(inputSchemas[check].parse(input), context) }
    case 'gauge': return { ...ruleSet.gauge(inputSchemas[check].parse(input), context) }
    case 'tensile': return { ...ruleSet.tensile(inputSchemas[check].parse(input), context) }
    case 'readings': return { ...ruleSet.readings(inputSchemas[check].parse(input), context) }
    case 'specimens': return ruleSet.specimens ? { ...ruleSet.specimens(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
    case 'toughness': return ruleSet.toughness ? { ...ruleSet.toughness(inputSchemas[check].parse(input), context) } : missing(ruleSet, check)
  }
}

function missing(ruleSet: RuleSet, check: CheckName): string {
  return `${check}: ${ruleSet.title} has no ${check} rules in this program`
}

export type EvaluationResult = Evaluated & ResultMeta

/**
 * Validate one request and evaluate it with its code's rules. Never throws: a request that
 * cannot be evaluated without guessing gives { error } with a message for the user.
 */
export function evaluate(request: unknown): EvaluationResult | ErrorResult {
  // The procedure standard ISO 15614-1 has its own inputs (mm, °C, ISO 4063 numbers); the other requests are unchanged.
  if (request !== null && typeof request === 'object' && (request as { code?: unknown }).code === 'iso-15614-1') {
    return evaluateIso15614(request) as unknown as EvaluationResult | ErrorResult
  }
  try {
    const envelope = envelopeSchema.safeParse(request)
    if (!envelope.success) return { error: formatIssues(envelope.error, '') }
    const { code, check, unit, input } = envelope.data
    const ruleSet = getRuleSet(code)
    const edition = envelope.data.edition ?? ruleSet.defaultEdition
    if (!ruleSet.editions.includes(edition)) {
      return { error: `edition: ${ruleSet.title} editions carried are ${ruleSet.editions.join(', ')}; got "${edition}"` }
    }
    if (check !== 'continuity' && !ruleSet.units.includes(unit)) {
      return { error: `unit: ${ruleSet.title} prints its ranges in ${ruleSet.units.join(' and ')}; send "unit": "${ruleSet.units[0]}"` }
    }
    const parsed = inputSchemas[check].safeParse(input)
    if (!parsed.success) return { error: formatIssues(parsed.error, 'input') }
    const result = run(ruleSet, check, input, { code, edition, unit })
    if (typeof result === 'string') return { error: result }
    const { reasons, ...fields } = result
    return { ...fields, reasons, code, edition, unit, caution: cautionText(code, edition) } as EvaluationResult
  }
  catch (error) {
    if (error instanceof RuleRefusal) return { error: error.message }
    return { error: `the rules could not evaluate this request: ${error instanceof Error ? error.message : String(error)}` }
  }
}

/** Evaluate one request or a list, keeping the order. */
export function evaluateAll(requests: unknown): Array<EvaluationResult | ErrorResult> | EvaluationResult | ErrorResult {
  return Array.isArray(requests) ? requests.map(request => evaluate(request)) : evaluate(requests)
}
