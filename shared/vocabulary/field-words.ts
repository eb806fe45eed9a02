// Field names as words on screens and sheets, in one place: the audit history (shared/utils/changes.ts) and the rules'
// "cannot tell" sentences (shared/rules/variables.ts) both read them from here. Trade abbreviations are written as the
// trade writes them (P-No., F-No., OD); other names are split into lower-case words (weldedOn → "welded on").
// No imports: shared/rules may import this file.

const tradeWords: Record<string, string> = {
  pNumber: 'P-No.',
  fNumber: 'F-No.',
  aNumber: 'A-No.',
  groupNumber: 'Group No.',
  ctwd: 'contact tip to work',
  pwht: 'PWHT',
  od: 'OD',
  outsideDiameter: 'pipe OD',
  procedureId: 'WPS',
  pqrId: 'PQR',
  welderId: 'welder',
  supportingPqrIds: 'supporting PQRs',
  min: 'from',
  max: 'to',
  transfer: 'transfer mode',
  progression: 'vertical progression',
  fillerAdded: 'filler metal (added or not)',
  consumableInsert: 'consumable insert',
  fillerForm: 'filler metal product form',
  backingGas: 'backing gas',
  current: 'current and polarity',
}

/** A field name in words: "pNumber" → "P-No.", "weldedOn" → "welded on", "backing_gas" → "backing gas". */
export function fieldWords(key: string): string {
  return tradeWords[key] ?? key.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/[_-]+/g, ' ').toLowerCase()
}
