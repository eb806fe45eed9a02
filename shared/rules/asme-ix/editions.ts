/**
 * ASME BPVC Section IX editions this module carries. Values that changed between editions:
 * QW-403.10 and the procedure use of QW-404.32 apply up to 2019 only (removed from QW-255 in 2021);
 * the QW-423.1 base-metal rows changed in 2015; the QW-433 F-No. groups are keyed the same way.
 */
export const asmeEditions = ['2010', '2013', '2015', '2017', '2019', '2021', '2023', '2025'] as const
export const asmeDefaultEdition = '2023'

export function editionYear(edition: string): number {
  return Number(edition)
}

export function atMost(edition: string, year: number): boolean {
  return editionYear(edition) <= year
}
