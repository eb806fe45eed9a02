import type { RuleSet } from '../rule-set'
import { continuity } from '../continuity-lapse'
import { gaugeThickness } from '../gauge'
import { arcEnergyClauses, heatInput } from '../heat-input'
import { checkReadings } from '../readings'
import { specimensByHand } from '../specimens-by-hand'
import { tensileStrength } from '../tensile'
import { bend } from './bend'
import { covers } from './covers'
import { welderRanges } from './welder-ranges'

/**
 * ISO 9606-1 (2012 with its corrigendum; EN ISO 9606-1:2017 is identical, with option c) added
 * to 9.3). Most ranges are from summary sheets or from memory: each reason's basis says which.
 */
export const iso96061: RuleSet = {
  code: 'iso-9606-1',
  title: 'ISO 9606-1',
  editions: ['2012', '2017'],
  defaultEdition: '2012',
  units: ['mm'],
  welderRanges,
  covers,
  bend,
  // 9.2: the employer confirms every six months that the welder has kept welding within the range.
  continuity: input => continuity(input, {
    clause: 'ISO 9606-1 9.2',
    ruleText: 'Every six months the employer\'s welding coordinator or responsible person must confirm that the welder has worked with the process within the range of qualification; without it the qualification lapses, whatever the 9.3 revalidation route.',
    convention: 'lapses-on-anniversary',
    basis: 'partial',
  }),
  heatInput: (input, context) => heatInput(input, context, arcEnergyClauses),
  gauge: gaugeThickness,
  tensile: tensileStrength,
  readings: (input, context) => checkReadings(input, context.unit),
  specimens: specimensByHand('ISO 9606-1', 'ISO 9606-1, 6.4'),
}
