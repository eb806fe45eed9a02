import type { SheetBlock } from './model'
import type { WelderTestRecord } from '../database/sheet-records'
import { designationOf } from '../database/welder-test-columns'
import { isoValidity, type IsoRoute, type IsoValidityRecord } from '#shared/rules/iso-9606-1/validity'
import type { IsoTestInput } from '#shared/schemas/welder-test'
import { isoButtDetails, isoConfirmers, isoFillerTypes, isoLayerings, isoRevalidationRoutes, isoTestMethods, isoValidityKinds } from '#shared/vocabulary/iso'
import { dash, printable } from './format'

/**
 * The ISO 9606-1 parts of a welder's certificate (clause 10 designation, 5.5/5.6/5.9 as tested, examiner, methods of
 * test, 9.3 route) and its validity (9.2 confirmations signed, expiry by the route on `today`). Only ISO 9606-1 tests
 * get these blocks; the sheets of the other codes are untouched.
 */
export function isoCertificateBlocks(record: WelderTestRecord, today: string): SheetBlock[] {
  const t = record.test
  if (t.code !== 'iso-9606-1') return []
  const iso = (t.iso ?? {}) as Partial<IsoTestInput>
  const details = iso.details ? `${iso.details} · ${{ ...isoButtDetails, ...isoLayerings }[iso.details as keyof typeof isoButtDetails & keyof typeof isoLayerings] ?? ''}` : dash
  const blocks: SheetBlock[] = [{
    heading: 'ISO 9606-1 certificate', clause: 'ISO 9606-1, 10',
    fields: [
      { label: 'Designation', value: designationOf(t) ?? dash, clause: 'ISO 9606-1, 10' },
      { label: 'Filler group', value: t.fNumber ? `FM${t.fNumber}` : dash, clause: 'ISO 9606-1, 5.5' },
      { label: 'Filler type', value: iso.fillerType ? `${iso.fillerType} · ${isoFillerTypes[iso.fillerType as keyof typeof isoFillerTypes] ?? ''}` : dash, clause: 'ISO 9606-1, 5.6' },
      { label: 'Weld details', value: details + (iso.gouging ? ` (${iso.gouging})` : ''), clause: 'ISO 9606-1, 5.9' },
      { label: 'Examiner', value: iso.examiner ? printable(iso.examiner) : dash },
      { label: 'Examining body', value: iso.examiningBody ? printable(iso.examiningBody) : dash },
      { label: 'Welder identification', value: iso.welderIdentification ? printable(iso.welderIdentification) : dash },
      { label: 'Methods of test', value: iso.testMethods?.length ? iso.testMethods.map(m => isoTestMethods[m]).join('; ') : dash, clause: 'ISO 9606-1, 6' },
      { label: 'Revalidation', value: iso.route ? isoRevalidationRoutes[iso.route] : dash, clause: 'ISO 9606-1, 9.3' },
    ],
  }]
  const records = record.isoRecords.map(r => ({ kind: r.kind, on: r.on }) as IsoValidityRecord)
  const validity = t.status === 'certified' && iso.route ? isoValidity({ testDate: t.testDate, route: iso.route as IsoRoute, records, today }) : null
  blocks.push({
    heading: 'Validity (confirmations and revalidation)', clause: 'ISO 9606-1, 9.2 and 9.3',
    ...(record.isoRecords.length
      ? { table: { columns: ['Date', 'Record', 'Signed by', 'Statement'], rows: record.isoRecords.map(r => [r.on, isoValidityKinds[r.kind as keyof typeof isoValidityKinds] ?? r.kind, `${printable(r.signerName)} (${isoConfirmers[r.confirmer as keyof typeof isoConfirmers] ?? r.confirmer})`, printable(r.reference ? `${r.statement}: ${r.reference}` : r.statement)]) } }
      : {}),
    notes: validity
      ? [`On ${today}: ${validity.current ? 'valid' : 'lapsed'}; lapses on ${validity.lapsesOn} (${validity.lapsedBy === 'confirmation' ? 'without a 9.2 confirmation' : 'end of 9.3 validity'}).`, ...validity.reasons.map(r => `${r.clause}: ${r.text}`)]
      : ['Validity runs from certification by the route of 9.3.'],
  })
  return blocks
}
