import type { VariableRow } from '../variables'

/**
 * AWS D1.3 welder essential variables: thickness, F-Number (SMAW), position, weld joint type,
 * process, coating and vertical progression (read on a WPQR guide, edition not stated; 4.7, 4.7.2,
 * Table 4.4). How coating and F-No. are compared is a choice of this module (exact match).
 */
export const d13WelderVariables: readonly VariableRow[] = [
  { id: 'code', clause: 'D1.3 4.7', field: 'production.code', compared: 'the joint\'s code must be AWS D1.3', basis: 'convention', mode: 'compared' },
  { id: 'scope', clause: 'D1.3 scope', field: 'thickness, form', compared: 'sheet of 3/16 in (4.8 mm) or less, not pipe', basis: 'verified', mode: 'compared' },
  { id: 'process', clause: 'D1.3 4.7 (process)', field: 'process', compared: 'the same process', basis: 'verified', mode: 'compared' },
  { id: 'joint', clause: 'D1.3 4.7 (joint type)', field: 'joint', compared: 'the same joint type (square-groove, flare-groove, fillet, plug, arc spot, arc seam)', basis: 'verified', mode: 'compared' },
  { id: 'position', clause: 'D1.3 Table 4.4', field: 'position / positions', compared: 'every production position in those the test qualifies', basis: 'verified', mode: 'compared' },
  { id: 'thickness', clause: 'D1.3 4.7.2', field: 'thickness', compared: 'sheet thickness within the range of the joint type', basis: 'verified', mode: 'compared' },
  { id: 'f-number', clause: 'D1.3 4.7 (F-Number)', field: 'fNumber', compared: 'SMAW: the same F-No. (exact match: the grouping is not carried)', basis: 'partial', processes: ['SMAW'], mode: 'compared' },
  { id: 'coating', clause: 'D1.3 4.7 (coating)', field: 'coating', compared: 'the same coating ("none" for uncoated; exact match)', basis: 'partial', mode: 'compared' },
  { id: 'progression', clause: 'D1.3 4.7 (vertical progression)', field: 'progression', compared: 'vertical welds: uphill and downhill qualify each other not', basis: 'verified', mode: 'compared' },
]
