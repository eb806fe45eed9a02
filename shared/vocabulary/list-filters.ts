import { codeChoices, pqrStatuses, procedureStatuses, processIds, welderStatuses, welderTestStatuses } from './records'

// The choices of the list pages' filter bars (components/data/DataFilterBar.vue), in one place: each select names the
// query parameter its list route reads (shared/schemas/list-queries.ts) and the words a user picks from.

export interface FilterChoice { value: string, label: string }
export interface FilterSelect { name: string, label: string, any: string, choices: readonly FilterChoice[], width?: string }

const choicesOf = <K extends string>(ids: readonly K[], words: Record<K, string>): FilterChoice[] => ids.map(value => ({ value, label: words[value] }))

export const procedureStatusWords: Record<typeof procedureStatuses[number], string> = { draft: 'Draft', approved: 'Approved', superseded: 'Superseded' }
export const pqrStatusWords: Record<typeof pqrStatuses[number], string> = { recorded: 'Recorded, not certified', certified: 'Certified', failed: 'Failed' }
export const welderTestStatusWords: Record<typeof welderTestStatuses[number], string> = { recorded: 'Recorded', certified: 'Certified', failed: 'Failed' }
export const welderStatusWords: Record<typeof welderStatuses[number], string> = { active: 'Active', inactive: 'Inactive' }

/** The outbox: where a message stands and what kind of message it is. */
export const mailStatuses = ['sent', 'queued', 'failed'] as const
export type MailStatus = typeof mailStatuses[number]
export const mailStatusWords: Record<MailStatus, string> = { queued: 'Waiting', sent: 'Sent', failed: 'Failed' }
export const mailKindWords: Record<string, string> = {
  'invitation': 'Invitation', 'password-reset': 'Password reset', 'lapse-reminder': 'Lapse reminder', 'weekly-digest': 'Weekly digest',
  'signoff-request': 'Sign-off request', 'revocation': 'Revocation notice',
}

const processFilter: FilterSelect = { name: 'process', label: 'Process', any: 'Any process', choices: processIds.map(p => ({ value: p, label: p })), width: 'w-32' }
const codeFilter: FilterSelect = { name: 'code', label: 'Code', any: 'Any code', choices: codeChoices, width: 'w-32' }

/** Each list page's selects, in the order they show. */
export const listFilters = {
  procedures: [
    { name: 'status', label: 'Status', any: 'Any status', choices: choicesOf(procedureStatuses, procedureStatusWords), width: 'w-36' },
    processFilter,
    codeFilter,
  ],
  pqrs: [
    { name: 'status', label: 'Results', any: 'Any results', choices: choicesOf(pqrStatuses, pqrStatusWords), width: 'w-40' },
    processFilter,
  ],
  welderTests: [
    { name: 'status', label: 'Status', any: 'Any status', choices: choicesOf(welderTestStatuses, welderTestStatusWords), width: 'w-40' },
  ],
  welders: [
    { name: 'status', label: 'Status', any: 'Any status', choices: choicesOf(welderStatuses, welderStatusWords), width: 'w-36' },
  ],
  mail: [
    { name: 'status', label: 'Status', any: 'Any status', choices: choicesOf(mailStatuses, mailStatusWords), width: 'w-40' },
    { name: 'kind', label: 'Kind', any: 'Any kind', choices: Object.entries(mailKindWords).map(([value, label]) => ({ value, label })), width: 'w-44' },
  ],
} satisfies Record<string, FilterSelect[]>
