import type { CodeId } from './types'

const codeNames: Record<CodeId, string> = {
  'asme-ix': 'ASME BPVC Section IX',
  'aws-d1.1': 'AWS D1.1',
  'aws-d1.3': 'AWS D1.3',
  'iso-9606-1': 'ISO 9606-1',
}

export function codeName(code: CodeId): string {
  return codeNames[code]
}

/** The caution every computed range or status carries, on screens and on sheets. */
export function cautionText(code: CodeId, edition: string): string {
  return `Computed from ${codeNames[code]}, ${edition} edition, as this program carries it. `
    + 'Rootface helps; it does not qualify anyone: the governing code edition, the shop\'s quality manual, '
    + 'the contract and the Authorized Inspector or certified welding inspector have the final word.'
}
