import type { VariableRow } from '../variables'

/**
 * ISO 9606-1:2012 clause 5 essential variables (5.2 process, 5.3 product type, 5.4 type of weld,
 * 5.5 filler material group, 5.6 filler material type, 5.7 dimensions, 5.8 positions, 5.9 weld
 * details). The ranges were read on summary sheets of DIN EN ISO 9606-1:2013 or are from memory;
 * each row says which.
 */
export const isoWelderVariables: readonly VariableRow[] = [
  { id: 'code', clause: 'ISO 9606-1, 1', field: 'production.code', compared: 'the joint\'s code must be ISO 9606-1', basis: 'convention', mode: 'compared' },
  { id: 'process', clause: 'ISO 9606-1, 5.2', field: 'process', compared: 'production process in those the test covers (135 covers 138; 141, 143, 145 each other)', basis: 'partial', mode: 'compared' },
  { id: 'transfer', clause: 'ISO 9606-1, 5.2', field: 'transfer', compared: 'short-circuit (131, 135, 138) covers the other modes; the others only themselves', basis: 'partial', processes: ['131', '135', '138'], mode: 'compared' },
  { id: 'product', clause: 'ISO 9606-1, 5.3', field: 'form, outsideDiameter', compared: 'plate covers pipe over 500 mm (rotating over 75 mm in PA, PB, PC, PD: check by hand); pipe over 25 mm covers plate', basis: 'partial', mode: 'compared' },
  { id: 'weld', clause: 'ISO 9606-1, 5.4', field: 'weld', compared: 'butt covers butt; fillet covers fillet (butt covers fillet only with a supplementary fillet test)', basis: 'partial', mode: 'compared' },
  { id: 'filler-group', clause: 'ISO 9606-1, 5.5', field: 'fNumber (FM group)', compared: 'FM1 ↔ FM2; FM3 → FM1–FM3; FM4 → FM1, FM2, FM4; FM5, FM6 themselves', basis: 'memory', mode: 'compared' },
  { id: 'filler-type', clause: 'ISO 9606-1, 5.6', field: 'fillerType', compared: 'covered electrodes: B covers A, RA, RB, RC, RR, R; C only C; others each other except B and C; wires: S ↔ M; B covers R, P, V, W, Y, Z; the others each other', basis: 'memory', mode: 'compared' },
  { id: 'thickness', clause: 'ISO 9606-1, 5.7, Tables 6 and 7', field: 'thickness / depositThickness', compared: 'butt: deposit s in the Table 6 range (each process its own s; the combination s1 + s2); fillet: plate t in Table 7', basis: 'partial', mode: 'compared' },
  { id: 'diameter', clause: 'ISO 9606-1, 5.7, Table 8', field: 'outsideDiameter', compared: 'pipe D in the Table 8 range', basis: 'verified', mode: 'compared' },
  { id: 'position', clause: 'ISO 9606-1, 5.8, Tables 9 and 10', field: 'position / positions', compared: 'every production position in those the test covers (PF/PG, PH/PJ carry the vertical progression)', basis: 'partial', mode: 'compared' },
  { id: 'details', clause: 'ISO 9606-1, 5.9', field: 'sides, backing', compared: 'single side without backing covers all; single side with backing and both sides cover each other only', basis: 'partial', mode: 'compared' },
  { id: 'layering', clause: 'ISO 9606-1, 5.9', field: 'layering', compared: 'fillet: multi-layer covers single and multi; single layer only single', basis: 'partial', mode: 'compared' },
]
