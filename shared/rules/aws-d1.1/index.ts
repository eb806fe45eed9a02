import type { RuleSet } from '../rule-set'
import { continuity } from '../continuity-lapse'
import { gaugeThickness } from '../gauge'
import { arcEnergyClauses, heatInput } from '../heat-input'
import { checkReadings } from '../readings'
import { tensileStrength } from '../tensile'
import { bend } from './bend'
import { covers } from './covers'
import { procedureRanges } from './procedure-ranges'
import { radiography } from './radiography'
import { d11DefaultEdition, d11Editions, d11Tables } from './editions'
import { specimens } from './specimens'
import { welderRanges } from './welder-ranges'
import { wpsSupport } from './wps-support'

/** AWS D1.1 Structural Welding Code — Steel: welder qualification. */
export const awsD11: RuleSet = {
  code: 'aws-d1.1',
  title: 'AWS D1.1',
  editions: d11Editions,
  defaultEdition: d11DefaultEdition,
  units: ['in', 'mm'],
  procedureRanges,
  wpsSupport,
  welderRanges,
  covers,
  bend,
  radiography,
  // Period of effectiveness (4.2.3.1 in 2015, 6.2.3 from 2020): "a period exceeding six months".
  continuity: (input, context) => continuity(input, {
    clause: d11Tables(context.edition).continuity,
    ruleText: 'A welder\'s qualification remains in effect indefinitely unless the welder has not been engaged in the process for a period exceeding six months, or there is a specific reason to question the welder\'s ability.',
    convention: 'lapses-day-after-anniversary',
    basis: 'verified',
  }),
  heatInput: (input, context) => heatInput(input, context, arcEnergyClauses),
  gauge: gaugeThickness,
  tensile: tensileStrength,
  readings: (input, context) => checkReadings(input, context.unit),
  specimens,
}
