import type { VariableRow } from '../variables'

const all = ['OFW', 'SMAW', 'SAW', 'GMAW', 'FCAW', 'GTAW', 'PAW'] as const
const arc = ['SMAW', 'GMAW', 'FCAW', 'GTAW', 'PAW'] as const
const gasShielded = ['GMAW', 'FCAW', 'GTAW', 'PAW'] as const
const tungsten = ['GTAW', 'PAW'] as const

/**
 * ASME BPVC IX welder essential variables, QW-350 (QW-352 OFW, QW-353 SMAW, QW-354 SAW,
 * QW-355 GMAW and FCAW, QW-356 GTAW, QW-357 PAW). Which paragraph each table lists is from memory
 * except QW-404.32 in QW-355 (read) and the position, diameter, thickness, P-No. and F-No. rules
 * (read in QW-452, QW-461.9, QW-423.1; QW-433 from memory). Every row is compared by covers();
 * the rows marked by-hand have no input in the request and are listed for the reviewer.
 */
export const asmeWelderVariables: readonly VariableRow[] = [
  { id: 'code', clause: 'QW-301', field: 'production.code', compared: 'the joint\'s code must be ASME IX: a test to another code never covers it', basis: 'convention', mode: 'compared' },
  { id: 'process', clause: 'QW-350, QW-351', field: 'process / processes[].process', compared: 'each production process needs a test layer of the same process', basis: 'partial', mode: 'compared' },
  { id: 'weld', clause: 'QW-303.1, QW-452.5, QW-452.6', field: 'weld', compared: 'a groove test qualifies groove and fillet welds; a fillet test fillet welds only', basis: 'verified', mode: 'compared' },
  { id: 'backing', clause: 'QW-402.4', field: 'backing', compared: 'a test with backing qualifies groove welds with backing only; without backing qualifies both (double-welded = with backing; a later process of a combination is welded on the earlier deposit, so with backing)', basis: 'memory', processes: arc, mode: 'compared' },
  { id: 'backing-added', clause: 'QW-402.7', field: 'backing', compared: 'OFW: a test without backing qualifies without backing only', basis: 'memory', processes: ['OFW'], mode: 'compared' },
  { id: 'thickness', clause: 'QW-403.2', field: 'couponThickness / thickness', compared: 'OFW: base metal up to the thickness tested (not carried: check by hand)', basis: 'memory', processes: ['OFW'], mode: 'by-hand' },
  { id: 'diameter', clause: 'QW-403.16, QW-452.3, QW-452.4', field: 'outsideDiameter', compared: 'pipe OD within the QW-452.3 (groove) or QW-452.4 (fillet) band; plate tests: 2-7/8 in OD and over', basis: 'verified', processes: all, mode: 'compared' },
  { id: 'p-number', clause: 'QW-403.18, QW-423.1', field: 'pNumber', compared: 'production P-No. in the QW-423.1 row of the test P-No. (rows keyed by edition)', basis: 'verified', processes: all, mode: 'compared' },
  { id: 'filler-added', clause: 'QW-404.14', field: 'fillerAdded', compared: 'deletion or addition of filler metal: must be the same', basis: 'memory', processes: ['OFW', ...tungsten], mode: 'compared' },
  { id: 'f-number', clause: 'QW-404.15, QW-433', field: 'fNumber', compared: 'production F-No. in the QW-433 group of the test F-No.', basis: 'memory', processes: all, mode: 'compared' },
  { id: 'consumable-insert', clause: 'QW-404.22', field: 'consumableInsert', compared: 'omission or addition of a consumable insert in a single-welded groove weld without backing: must be the same', basis: 'memory', processes: tungsten, mode: 'compared' },
  { id: 'filler-form', clause: 'QW-404.23', field: 'fillerForm', compared: 'product form family: flux-cored; solid or metal-cored; powder', basis: 'memory', processes: tungsten, mode: 'compared' },
  { id: 'deposit', clause: 'QW-404.30, QW-452.1(b)', field: 'depositThickness / thickness', compared: 'production deposit of the process up to the test\'s: 2t, or the maximum to be welded from 1/2 in in 3 layers (per process: QW-452.1(b) Note 1)', basis: 'verified', processes: ['SMAW', 'SAW', 'GMAW', 'FCAW', 'GTAW', 'PAW'], mode: 'compared' },
  { id: 'deposit-gmaw-s', clause: 'QW-404.32', field: 'depositThickness / thickness', compared: 'GMAW short-circuit under 1/2 in: up to 1.1t', basis: 'verified', processes: ['GMAW'], mode: 'compared' },
  { id: 'position', clause: 'QW-405.1, QW-461.9', field: 'position / positions', compared: 'every production position in the QW-461.9 column of the test positions', basis: 'verified', processes: all, mode: 'compared' },
  { id: 'progression', clause: 'QW-405.3', field: 'progression', compared: 'vertical welds: uphill and downhill qualify each other not (a cap or wash pass may go either way: check by hand)', basis: 'memory', processes: arc, mode: 'compared' },
  { id: 'fuel-gas', clause: 'QW-408.7', field: '—', compared: 'OFW: change of fuel gas (no input: check by hand)', basis: 'memory', processes: ['OFW'], mode: 'by-hand' },
  { id: 'backing-gas', clause: 'QW-408.8', field: 'backingGas', compared: 'omission of inert backing gas, in a single-welded groove weld without backing: a test with gas backing qualifies only with it', basis: 'memory', processes: gasShielded, mode: 'compared' },
  { id: 'transfer', clause: 'QW-409.2', field: 'transfer', compared: 'short-circuit and spray/globular/pulse qualify each other not', basis: 'memory', processes: ['GMAW', 'FCAW'], mode: 'compared' },
  { id: 'current', clause: 'QW-409.4', field: 'current', compared: 'AC, DCEP and DCEN: must be the same', basis: 'memory', processes: tungsten, mode: 'compared' },
]

export function listsVariable(process: string, id: string): boolean {
  const row = asmeWelderVariables.find(v => v.id === id)
  return row !== undefined && (row.processes === undefined || row.processes.includes(process))
}
