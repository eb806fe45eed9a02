import { z } from 'zod'
import { codeIds, processIds } from '../vocabulary/records'
import { calendarDate, optionalText, requiredText } from './fields'

const codeWords: Record<string, (typeof codeIds)[number]> = {
  'asme ix': 'asme-ix', 'asme-ix': 'asme-ix', 'asme section ix': 'asme-ix', 'asme bpvc ix': 'asme-ix',
  'aws d1.1': 'aws-d1.1', 'd1.1': 'aws-d1.1', 'aws-d1.1': 'aws-d1.1',
  'aws d1.3': 'aws-d1.3', 'd1.3': 'aws-d1.3', 'aws-d1.3': 'aws-d1.3',
  'iso 9606-1': 'iso-9606-1', '9606-1': 'iso-9606-1', 'iso-9606-1': 'iso-9606-1', 'en iso 9606-1': 'iso-9606-1',
}

/** A code as a shop's register writes it ("ASME IX", "D1.1", "EN ISO 9606-1"), read as Rootface's code id. */
export const importedCodeSchema = z.string({ required_error: 'Enter the code' }).trim()
  .transform(v => codeWords[v.toLowerCase().replace(/\s+/g, ' ')] ?? v)
  .pipe(z.enum(codeIds, { errorMap: () => ({ message: 'Code: ASME IX, AWS D1.1, AWS D1.3 or ISO 9606-1' }) }))

/** One line of a shop's welder test history: the ranges as its own record states them, in its own words. */
export const importedTestRowSchema = z.object({
  stamp: requiredText('the welder\'s stamp', 20),
  process: z.string({ required_error: 'Enter the process' }).trim().toUpperCase()
    .pipe(z.enum(processIds, { errorMap: () => ({ message: `Process: one of ${processIds.join(', ')}` }) })),
  code: importedCodeSchema,
  edition: optionalText('Edition', 20),
  testDate: calendarDate('Test date'),
  positions: optionalText('Positions', 200),
  thickness: optionalText('Thickness range', 200),
  diameter: optionalText('Diameter range', 200),
  otherRanges: optionalText('Other ranges', 1000),
  reference: optionalText('Certificate or record number', 120),
})
export type ImportedTestRow = z.infer<typeof importedTestRowSchema>

/** One line of a shop's register of WPSs or PQRs: the header only, as recorded. */
export const importedDocumentRowSchema = z.object({
  number: requiredText('the number', 40),
  revision: optionalText('Revision', 20).transform(v => v ?? ''),
  title: optionalText('Title', 200),
  code: importedCodeSchema,
  edition: optionalText('Edition', 20),
  processes: optionalText('Processes', 120),
  documentDate: z.preprocess(v => (v === '' ? undefined : v), calendarDate('Date').optional()).transform(v => v ?? null),
  status: optionalText('Status', 40),
})
export type ImportedDocumentRow = z.infer<typeof importedDocumentRowSchema>
