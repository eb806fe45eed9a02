import { standingWords } from '#shared/qualification/process-standing'
import type { SheetBlock, SheetModel } from './model'
import type { ContinuityLog } from './continuity-log'
import { caution } from './common'
import { printable } from './format'

export interface Issue { code: string, url: string, issuerName: string, issuedAt: string }

/** A welder's continuity log for a period: the tests that start each chain, every logged use, and the standing. */
export function continuitySheet(log: ContinuityLog, shop: string, issue: Issue): SheetModel {
  const { welder, period } = log
  const blocks: SheetBlock[] = [
    {
      heading: 'Welder and period',
      fields: [
        { label: 'Name', value: printable(welder.name) },
        { label: 'Identification stamp', value: printable(welder.stamp) },
        { label: 'Period', value: `${period.from} to ${period.to}` },
        { label: 'Roster status', value: welder.status },
      ],
    },
    {
      heading: 'Certified tests that start each chain', clause: 'QW-322.2',
      table: {
        columns: ['Process', 'Test date', 'WPS followed', 'Record'],
        rows: log.tests.map(t => [t.process, t.testDate, t.procedure ?? '—', `WPQ-${t.id}`]),
      },
      notes: log.tests.length ? undefined : ['No certified test on record up to the end of the period.'],
    },
    {
      heading: `Standing on ${period.to}`, clause: 'QW-322.1',
      table: {
        columns: ['Process', 'Last use', 'Lapses on', 'Standing', 'Not current in the period'],
        rows: log.standings.map(s => [
          s.process,
          s.standing?.lastUse ?? '—',
          s.standing?.lapsesOn ?? '—',
          s.standing ? standingWords[s.standing.standing] : 'no certified test',
          s.gaps.length ? s.gaps.map(g => `${g.from} to ${g.to}${g.why === 'no-test' ? ' (no test yet)' : g.why === 'never-held' ? ' (never tested in this process)' : g.why === 'revoked' ? ` (revoked: ${g.reason ?? ''})` : ''}`).join('; ') : 'none',
        ]),
        widths: [48, 60, 60, 70, '*'],
      },
      notes: log.standings[0]?.standing ? [log.standings[0].standing.rule] : undefined,
    },
    {
      heading: 'Logged uses in the period',
      table: {
        columns: ['Date', 'Process', 'Reference', 'Recorded by'],
        rows: log.uses.map(u => [u.weldedOn, u.process, printable(u.reference), printable(u.recordedBy ?? '—')]),
        widths: [60, 48, '*', 120],
      },
      notes: log.uses.length ? undefined : ['No use logged in the period.'],
    },
  ]
  return {
    kind: 'continuity', kindTitle: 'Continuity log', shopName: shop, number: `CL-${printable(welder.stamp)}`, revision: null,
    subtitle: `${printable(welder.name)} (${printable(welder.stamp)}), ${period.from} to ${period.to}`,
    codeLine: null, unit: null, status: 'issued', banner: null, blocks, statement: null,
    signatures: [{ meaning: 'issued', name: printable(issue.issuerName), at: issue.issuedAt, version: 1 }],
    hash: { value: log.sha256, label: 'SHA-256 of the log as issued', matchesSigned: true },
    verify: { code: issue.code, url: issue.url },
    caution: log.tests[0] ? caution(log.tests[0].code, log.tests[0].edition) : caution('', ''),
  }
}
