import { cautionText, codeName } from '#shared/rules/caution'
import type { CodeId, Reason } from '#shared/rules/types'
import { iso15614Caution } from '#shared/rules/iso-15614-1'
import type { SheetBlock, SheetModel } from './model'
import type { SignatureSet } from '../database/sheet-records'

/** The code paragraph of each group of variables, for the codes whose paragraphs this program carries. */
const asmeGroups = {
  joints: 'QW-402', base: 'QW-403', filler: 'QW-404', positions: 'QW-405', preheat: 'QW-406', pwht: 'QW-407',
  gas: 'QW-408', electrical: 'QW-409', technique: 'QW-410', tension: 'QW-150', bend: 'QW-160', toughness: 'QW-170',
} as const
export type VariableGroup = keyof typeof asmeGroups

export function groupClause(code: string, group: VariableGroup): string | undefined {
  return code === 'asme-ix' ? asmeGroups[group] : undefined
}

export function isCode(code: string): code is CodeId {
  return ['asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1'].includes(code)
}

export function codeLine(code: string, edition: string) {
  return isCode(code) ? `${codeName(code)}, ${edition} edition` : `${code}, ${edition}`
}

/** A procedure's code line: a WPS or PQR recorded with the ISO code is ISO 15609-1 / ISO 15614-1, never the welder standard. */
export function procedureCodeLine(code: string, edition: string, record: 'wps' | 'pqr') {
  if (code === 'iso-15614-1') return record === 'wps' ? `ISO 15609-1 (WPS), qualified to ISO 15614-1:${edition}` : `ISO 15614-1:${edition} (WPQR)`
  return code === 'iso-9606-1' ? `${record === 'wps' ? 'ISO 15609-1 (WPS), qualified to ISO 15614-1' : 'ISO 15614-1 (WPQR)'} (recorded under the ISO code, ${edition})` : codeLine(code, edition)
}

/** A procedure's caution: the ISO procedure standard's words for a WPS or PQR recorded with the ISO code. */
export function procedureCaution(code: string, edition: string) {
  return code === 'iso-9606-1' || code === 'iso-15614-1' ? iso15614Caution : caution(code, edition)
}

export function caution(code: string, edition: string) {
  return isCode(code)
    ? cautionText(code, edition)
    : 'Rootface helps; it does not qualify anyone: the governing code edition, the shop\'s quality manual, the contract and the Authorized Inspector or certified welding inspector have the final word.'
}

/** The certification the signers of a test record make, in this program's words. */
export function certification(code: string, edition: string, what: 'coupon' | 'coupons', record?: 'pqr') {
  return `The signers certify that the statements in this record are correct and that the test ${what === 'coupon' ? 'coupon was' : 'coupons were'} `
    + `prepared, welded and tested in accordance with the requirements of ${record ? procedureCodeLine(code, edition, record) : codeLine(code, edition)}.`
}

export function reasonsBlock(heading: string, reasons: Reason[], clause?: string): SheetBlock {
  return {
    heading, clause,
    table: {
      columns: ['Clause', 'What it gives', 'Read from'],
      rows: reasons.map(r => [r.clause, r.text, basisWords[r.basis] ?? r.basis]),
      widths: [78, '*', 58],
    },
  }
}

const basisWords: Record<string, string> = {
  verified: 'code text',
  partial: 'partly checked',
  memory: 'from memory',
  convention: 'convention',
}

/** Hash, verification code and the matching state, from the record's signatures. */
export function signedParts(signed: SignatureSet, origin: string): Pick<SheetModel, 'signatures' | 'hash' | 'verify'> {
  const latest = signed.latest
  return {
    signatures: signed.signatures,
    hash: latest
      ? { value: latest.sha256, label: 'SHA-256 of the signed content', matchesSigned: latest.sha256 === signed.current }
      : { value: signed.current, label: 'SHA-256 of the content (not signed)', matchesSigned: null },
    verify: latest ? { code: latest.verifyCode, url: verifyUrl(origin, latest.verifyCode) } : null,
  }
}

export function verifyUrl(origin: string, code: string) {
  return `${origin.replace(/\/$/, '')}/verify/${code}`
}
