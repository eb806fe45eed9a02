import type { RuleSet } from '../rule-set'
import { continuity } from '../continuity-lapse'
import { gaugeThickness } from '../gauge'
import { asmeHeatInputClauses, heatInput } from '../heat-input'
import { checkReadings } from '../readings'
import { tensileStrength } from '../tensile'
import { bend } from './bend'
import { covers } from './covers'
import { asmeDefaultEdition, asmeEditions } from './editions'
import { procedureRanges } from './procedure-ranges'
import { radiography } from './radiography'
import { welderRanges } from './welder-ranges'
import { wpsSupport } from './wps-support'
import { specimens } from './specimens'
import { toughness } from '../toughness'

/** ASME BPVC Section IX: procedure and performance qualification. */
export const asmeIx: RuleSet = {
  code: 'asme-ix',
  title: 'ASME BPVC Section IX',
  editions: asmeEditions,
  defaultEdition: asmeDefaultEdition,
  units: ['in', 'mm'],
  procedureRanges,
  wpsSupport,
  welderRanges,
  covers,
  bend,
  radiography,
  // QW-322.1(a): a welder who has not welded with a process for 6 months or more loses that process.
  continuity: input => continuity(input, {
    clause: 'QW-322.1(a)',
    ruleText: 'A welder who has not welded with a process during a period of 6 months or more loses the qualifications for that process (per process, not per position, diameter or F-Number).',
    convention: 'lapses-on-anniversary',
    basis: 'verified',
  }),
  heatInput: (input, context) => heatInput(input, context, asmeHeatInputClauses),
  gauge: gaugeThickness,
  tensile: tensileStrength,
  readings: (input, context) => checkReadings(input, context.unit),
  specimens,
  toughness,
}
