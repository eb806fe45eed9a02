import type { RuleSet } from '../rule-set'
import { continuity } from '../continuity-lapse'
import { gaugeThickness } from '../gauge'
import { arcEnergyClauses, heatInput } from '../heat-input'
import { checkReadings } from '../readings'
import { specimensByHand } from '../specimens-by-hand'
import { tensileStrength } from '../tensile'
import { covers } from './covers'
import { welderRanges } from './welder-ranges'

/**
 * The clause labels of these rules are the Section 4 numbers of the older edition (4.7, 4.7.2, Table 4.4). AWS D1.3:2018
 * moved qualification to clause 6 (docs/sources.md, B5); its new numbers were not seen, so a 2018 answer names clause 6
 * and says which older number the rule had, rather than print an older number as if it were the 2018 one.
 */
function editionLabels<T extends { reasons: { clause: string }[] }>(result: T, edition: string): T {
  if (edition < '2018') return result
  const relabel = (clause: string) => clause.replace(/^D1\.3 ((?:Table )?4\.[\d.]*\d)/, 'D1.3:2018 clause 6 (numbered $1 in 2008)')
  return { ...result, reasons: result.reasons.map(r => ({ ...r, clause: relabel(r.clause) })) }
}

/** AWS D1.3 Structural Welding Code — Sheet Steel (3/16 in and less): welder qualification. */
export const awsD13: RuleSet = {
  code: 'aws-d1.3',
  title: 'AWS D1.3',
  // The welder guide read for these rules does not state its edition (probably 2008 or 2018).
  editions: ['2008', '2018'],
  defaultEdition: '2018',
  units: ['in', 'mm'],
  welderRanges: (input, context) => editionLabels(welderRanges(input, context), context.edition),
  covers: (input, context) => editionLabels(covers(input, context), context.edition),
  // Period of effectiveness: six months, as in D1.1 (secondary source, no clause number seen).
  continuity: input => continuity(input, {
    clause: 'D1.3 period of effectiveness',
    ruleText: 'A welder\'s qualification remains in effect unless the welder has not engaged in the process for a period exceeding six months.',
    convention: 'lapses-day-after-anniversary',
    basis: 'partial',
  }),
  heatInput: (input, context) => heatInput(input, context, arcEnergyClauses),
  gauge: gaugeThickness,
  tensile: tensileStrength,
  readings: (input, context) => checkReadings(input, context.unit),
  specimens: specimensByHand('AWS D1.3', 'D1.3 4.7'),
}
