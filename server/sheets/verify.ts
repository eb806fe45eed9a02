import type { Db } from '../database/client'
import type { signatures } from '../database/schema'
import { contentFormatOf, contentHash, type SignedRecordType } from '../database/signing'
import { issuedSheetByCode, recordHead, signatureByCode, signersOf, welderOf } from '../database/sheet-records'
import { missing, type Outcome } from '../../shared/types/outcome'
import { loadContinuityLog } from './continuity-log'
import { verifyRegister } from './packet-joints'

export interface Verification {
  code: string
  sheet: string
  number: string
  revision: number | null
  /** A line the sheet itself prints under its number (welder and process for a WPQ, period for a log) */
  subject: string | null
  status: string
  signers: { meaning: string, name: string, at: string }[]
  /** unchanged: the stored content still hashes to the signed value; changed: it does not */
  state: 'unchanged' | 'changed'
  signedSha256: string
}

const sheetNames: Record<SignedRecordType, string> = {
  'procedure': 'Welding procedure specification (WPS)',
  'pqr': 'Procedure qualification record (PQR)',
  'welder-test': 'Welder performance qualification (WPQ)',
}

/** What the public verification page shows for a code: no more than the sheet itself prints. Missing for an unknown code. */
export async function verifyCode(db: Db, code: string): Promise<Outcome<Verification>> {
  const signature = await signatureByCode(db, code)
  if (signature) return await verifySigned(db, code, signature) ?? missing('Sheet with this code')
  const issue = await issuedSheetByCode(db, code)
  if (!issue) return missing('Sheet with this code')
  if (issue.kind === 'weld-register') return await verifyRegister(db, issue) ?? missing('Sheet with this code')
  if (issue.welderId === null || issue.periodFrom === null || issue.periodTo === null) return missing('Sheet with this code')
  const welder = await welderOf(db, issue.welderId)
  const log = await loadContinuityLog(db, issue.welderId, { from: issue.periodFrom, to: issue.periodTo })
  return {
    code, sheet: 'Continuity log', number: `CL-${welder?.stamp ?? ''}`, revision: null,
    subject: `${welder?.name ?? ''} (${welder?.stamp ?? ''}), ${issue.periodFrom} to ${issue.periodTo}`,
    status: 'issued', signers: [{ meaning: 'issued', name: issue.issuerName, at: issue.issuedAt.toISOString() }],
    state: log?.sha256 === issue.sha256 ? 'unchanged' : 'changed', signedSha256: issue.sha256,
  }
}

async function verifySigned(db: Db, code: string, signature: typeof signatures.$inferSelect): Promise<Verification | null> {
  const type = signature.recordType as SignedRecordType
  const id = signature.recordId
  const head = await recordHead(db, type, id)
  if (!head) return null
  const all = await signersOf(db, type, id)
  const current = await contentHash(db, type, id, contentFormatOf(signature.contentFormat))
  return {
    code, sheet: sheetNames[type], ...head,
    signers: all.filter(s => s.version === signature.recordVersion).map(s => ({ meaning: s.meaning, name: s.name, at: s.at.toISOString() })),
    state: current === signature.sha256 ? 'unchanged' : 'changed', signedSha256: signature.sha256,
  }
}
