/**
 * AWS D1.1 editions carried. Qualification was Clause 4 in 2015 (Tables 4.10/4.11) and Clause 6
 * from 2020 (Tables 6.10/6.11, plate); from 2020 pipe and tube welder tests are in Clause 10
 * (Tables 10.12/10.13).
 */
export const d11Editions = ['2015', '2020', '2025'] as const
export const d11DefaultEdition = '2020'

export function clause4(edition: string): boolean {
  return Number(edition) <= 2015
}

export function d11Tables(edition: string) {
  const old = clause4(edition)
  return {
    platePositions: old ? 'Table 4.10' : 'Table 6.10',
    plateThickness: old ? 'Table 4.11' : 'Table 6.11',
    pipePositions: old ? 'Table 4.10' : 'Table 10.12',
    pipeRanges: old ? 'Table 4.11' : 'Table 10.13',
    continuity: old ? '4.2.3.1' : '6.2.3',
    bend: old ? '4.9.3.3' : 'Clause 6 bend acceptance (4.9.3.3 in the 2015 edition)',
    // From memory: the WPQ essential-variable table (Table 4.12 in 2015) and the SMAW electrode groups (Table 4.13 in 2015).
    essentials: old ? 'Table 4.12' : 'Clause 6 WPQ essential variables table (Table 4.12 in 2015)',
    electrodeGroups: old ? 'Table 4.13' : 'Clause 6 electrode groups table (Table 4.13 in 2015)',
  }
}
