import type { RuleSet } from '../rule-set'
import { continuity } from '../continuity'
import { gaugeThickness } from '../gauge'
import { arcEnergyClauses, heatInput } from '../heat-input'
import { checkReadings } from '../readings'
import { specimensByHand } from '../specimens-by-hand'
import { tensileStrength } from '../tensile'
import { covers } from './covers'
import { welderRanges } from './welder-ranges'

/** AWS D1.3 Structural Welding Code — Sheet Steel (3/16 in and less): welder qualification. */
export const awsD13: RuleSet = {
  code: 'aws-d1.3',
  title: 'AWS D1.3',
  // The welder guide read for these rules does not state its edition (probably 2008 or 2018).
  editions: ['2008', '2018'],
  defaultEdition: '2018',
  units: ['in', 'mm'],
  welderRanges,
  covers,
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
