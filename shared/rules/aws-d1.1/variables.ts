import type { VariableRow } from '../variables'

/**
 * AWS D1.1 welder essential variables (the WPQ essential-variable table: Table 4.12 in the 2015
 * edition, Clause 6 from 2020; its rows are from memory) and the position and thickness tables
 * (Tables 6.10/6.11 and 10.12/10.13, read). Base metal is not a welder variable in D1.1.
 */
export const d11WelderVariables: readonly VariableRow[] = [
  { id: 'code', clause: 'Clause 6 (Clause 4 in 2015)', field: 'production.code', compared: 'the joint\'s code must be AWS D1.1: a test to another code never covers it', basis: 'convention', mode: 'compared' },
  { id: 'process', clause: 'WPQ essential variables (1)', field: 'process', compared: 'the same process; GMAW-S (short-circuit) is a process of its own', basis: 'memory', mode: 'compared' },
  { id: 'transfer', clause: 'WPQ essential variables (1), GMAW-S', field: 'transfer', compared: 'GMAW short-circuit and spray/globular/pulse qualify each other not', basis: 'memory', processes: ['GMAW'], mode: 'compared' },
  { id: 'f-number', clause: 'WPQ essential variables (2), electrode groups', field: 'fNumber', compared: 'SMAW electrode group F1–F4: a group qualifies itself and the lower groups', basis: 'memory', processes: ['SMAW'], mode: 'compared' },
  { id: 'weld', clause: 'Table 6.10 / 10.12', field: 'weld', compared: 'a CJP groove test qualifies groove (CJP, PJP) and fillet welds; a fillet test fillet welds only', basis: 'verified', mode: 'compared' },
  { id: 'position', clause: 'WPQ essential variables (3), Table 6.10 / 10.12', field: 'position / positions', compared: 'every production position in the positions the test qualifies', basis: 'verified', mode: 'compared' },
  { id: 'thickness', clause: 'WPQ essential variables (4), Table 6.11 / 10.13', field: 'thickness', compared: 'production thickness within the plate or wall range of the test', basis: 'verified', mode: 'compared' },
  { id: 'diameter', clause: 'WPQ essential variables (4), Table 10.13; Table 6.10 note b', field: 'outsideDiameter', compared: 'pipe size within the range of a pipe test; a plate test: pipe of 24 in and over with backing or backgouging', basis: 'verified', mode: 'compared' },
  { id: 'progression', clause: 'WPQ essential variables (5)', field: 'progression', compared: 'vertical welds: uphill and downhill qualify each other not', basis: 'memory', mode: 'compared' },
  { id: 'backing', clause: 'WPQ essential variables (6)', field: 'backing', compared: 'omission of backing in CJP welds from one side: a test with backing qualifies with backing only', basis: 'memory', mode: 'compared' },
]
