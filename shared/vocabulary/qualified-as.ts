// Who a welder test qualifies (ASME IX QW-300.1, QW-360; AWS D1.1 Clause 6 "welders and welding operators"):
// a welder (manual or semi-automatic) or a welding operator (machine or automatic welding).
export const qualifiedAsValues = ['welder', 'welding-operator'] as const
export type QualifiedAs = typeof qualifiedAsValues[number]

export const qualifiedAsWords: Record<QualifiedAs, string> = {
  'welder': 'Welder',
  'welding-operator': 'Welding operator',
}

const operatorSuffix = ' (welding operator)'

/**
 * The key a qualification's standing is kept under: the process for a welder, the process marked "(welding operator)"
 * for a welding operator, so a machine qualification never keeps a manual one alive or the other way round.
 */
export function standingKey(process: string, qualifiedAs: string): string {
  return qualifiedAs === 'welding-operator' ? `${process}${operatorSuffix}` : process
}

/** The process a standing key is about (continuity entries are logged per process: QW-322.1(a) counts either use). */
export function processOfKey(key: string): string {
  return key.endsWith(operatorSuffix) ? key.slice(0, -operatorSuffix.length) : key
}

export function isOperatorKey(key: string): boolean {
  return key.endsWith(operatorSuffix)
}
