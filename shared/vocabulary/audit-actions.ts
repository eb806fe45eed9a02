import { fieldWords } from './field-words'
import { recordNames } from './records'

// What the audit trail stores as an action id ('procedure.approve') and what a person reads ("Approved and signed"):
// one list, used by the History panel of every record and the audit trail page. An action missing here still reads
// as words (its verb from `verbs`, or its id split into words), never as the raw id.

const actions: Record<string, string> = {
  'create': 'Created',
  'update': 'Changed',
  'delete': 'Deleted',
  'attach': 'Attached',
  'detach': 'Detached',
  'grant': 'Auditor given access',
  'revoke': 'Auditor access taken away',
  'certify': 'Certified and signed',
  'bulk': 'Logged for several welders at once',
  'import': 'Imported from a CSV file',
  'import-undo': 'CSV import undone',
  'trials.settings': 'Welders allowed or not allowed to record trial runs',
  'trials.create': 'Trial series started',
  'trials.update': 'Trial series changed',
  'trials.bead': 'Bead recorded',
  'trials.bead.remove': 'Bead removed',
  'trials.start.create': 'Starting point added',
  'trials.start.remove': 'Starting point removed',
  'confirm': 'Imported ranges confirmed by the inspector',
  'override': 'Refusal overridden with a written reason',
  'from-joint': 'Continuity logged from a welded joint',
  'welded': 'Joint marked welded',
  'repair': 'Repair recorded',
  'examination': 'Examination result recorded',
  'export.archive': 'Every record exported as one archive',
  'export.table': 'A table exported',
  'iso-validity': 'ISO 9606-1 confirmation or production-weld record signed',
  'backup': 'Database backed up',
  'seed': 'Demo shop loaded',
  'requeue': 'Mail queued again',
  'invite': 'Invited',
  'reinvite': 'Invitation sent again',
  'accept-invitation': 'Invitation accepted',
  'request-password-reset': 'Password reset asked for',
  'reset-password': 'Password reset',
  'sign-out-everywhere': 'Signed out on every device',
  'deactivate': 'Sign-in turned off',
  'reactivate': 'Sign-in turned on again',
  'calendar-feed': 'Calendar subscription address made',
  'calendar-feed-off': 'Calendar subscription turned off',
  'base-metal.create': 'Base metal added',
  'base-metal.update': 'Base metal changed',
  'filler-metal.create': 'Filler metal added',
  'filler-metal.update': 'Filler metal changed',
  'procedure.create': 'WPS drafted',
  'procedure.update': 'WPS draft changed',
  'procedure.approve': 'Approved and signed',
  'procedure.supersede': 'Superseded by a newer revision',
  'procedure.revise': 'New revision started',
  'procedure.discard': 'Draft discarded',
  'reading.record': 'Reading recorded',
  'pqr.create': 'PQR recorded',
  'pqr.update': 'PQR changed',
  'pqr.results': 'Test results recorded',
  'pqr.certify': 'Certified and signed',
  'packet.request': 'Auditor packet asked for',
  'packet.download': 'Auditor packet downloaded',
  'sheet.download': 'Sheet downloaded',
  'signoff.request': 'Sign-off asked for',
  'signoff.done': 'Sign-off done',
  'signoff.withdrawn': 'Sign-off request withdrawn',
}

/** The action ids that have their own sentence. */
export const actionIds = Object.keys(actions)

const verbs: Record<string, string> = {
  create: 'added', update: 'changed', delete: 'deleted', approve: 'approved', certify: 'certified', request: 'asked for',
  download: 'downloaded', record: 'recorded', revoke: 'revoked', restore: 'restored', import: 'imported',
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1)

/** An audit action in plain words: 'procedure.approve' → "Approved and signed"; an unknown 'weld.create' → "Weld added". */
export function actionWords(action: string): string {
  const known = actions[action]
  if (known) return known
  const dot = action.lastIndexOf('.')
  const subject = dot < 0 ? '' : fieldWords(action.slice(0, dot))
  const verb = action.slice(dot + 1)
  const said = verbs[verb] ?? fieldWords(verb)
  return capital(subject ? `${subject} ${said}` : said)
}

/** The kind of record an audit event is about, in words: 'welder-test' → "welder test (WPQ)". */
export function recordTypeWords(recordType: string): string {
  return (recordNames as Record<string, string>)[recordType] ?? fieldWords(recordType)
}
