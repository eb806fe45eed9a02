// The words of ISO 9606-1 welder qualification, in one place: schemas, forms, rules, sheets and the seed import them.
// Process numbers are those of ISO 4063, positions those of ISO 6947. Where a list comes from memory it says so.

/** ISO 4063 reference numbers carried for ISO 9606-1 tests, with their plain names (ISO 4063, from memory). */
export const isoProcessNames = {
  111: 'manual metal arc (covered electrode)',
  114: 'self-shielded tubular-cored arc',
  121: 'submerged arc, solid wire',
  125: 'submerged arc, tubular-cored wire',
  131: 'MIG, solid wire',
  135: 'MAG, solid wire',
  136: 'MAG, flux-cored wire',
  138: 'MAG, metal-cored wire',
  141: 'TIG, solid filler',
  142: 'TIG, no filler',
  143: 'TIG, tubular-cored filler',
  145: 'TIG, reducing gas, solid filler',
  15: 'plasma arc',
  311: 'oxy-acetylene (gas) welding',
} as const satisfies Record<string, string>

/** The ISO 4063 numbers as the records store them (text, "135"). Keep the order of the rules' own list. */
export const isoProcessIds = ['111', '114', '121', '125', '131', '135', '136', '138', '141', '142', '143', '145', '15', '311'] as const
export type IsoProcessId = typeof isoProcessIds[number]

/** ISO 4063 processes whose metal transfer is stated (short-circuit qualifies the other modes: ISO 9606-1, 5.2). */
export const isoTransferProcesses = ['131', '135', '136', '138'] as const

/** ISO 6947 positions, in the order results list them (PA–PH, PJ, and the inclined pipe positions). */
export const isoPositions = ['PA', 'PB', 'PC', 'PD', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045'] as const
export type IsoPosition = typeof isoPositions[number]
/** The ISO 6947 positions in plain words (from memory of ISO 6947). */
export const isoPositionWords: Record<IsoPosition, string> = {
  'PA': 'flat', 'PB': 'horizontal-vertical', 'PC': 'horizontal', 'PD': 'horizontal-overhead', 'PE': 'overhead',
  'PF': 'vertical up', 'PG': 'vertical down', 'PH': 'pipe, vertical up', 'PJ': 'pipe, vertical down',
  'H-L045': 'pipe inclined 45°, up', 'J-L045': 'pipe inclined 45°, down',
}
/** Test positions a butt weld is welded in (ISO 9606-1 Table 9 rows). */
export const isoButtTestPositions = ['PA', 'PC', 'PE', 'PF', 'PG', 'PH', 'PJ', 'H-L045', 'J-L045'] as const satisfies readonly IsoPosition[]
/** Test positions a fillet weld is welded in (ISO 9606-1 Table 10 rows; PG, PH, PJ from memory). */
export const isoFilletTestPositions = ['PA', 'PB', 'PD', 'PF', 'PG', 'PH', 'PJ'] as const satisfies readonly IsoPosition[]

/** Product type (ISO 9606-1, 5.3): P plate, T pipe (tube). */
export const isoProductTypes = { plate: 'P', pipe: 'T' } as const
/** Type of weld (ISO 9606-1, 5.4): BW butt weld, FW fillet weld. */
export const isoWeldTypes = { groove: 'BW', fillet: 'FW' } as const

/** Filler material groups (ISO 9606-1 Table 2, from memory: FM1 non-alloy and fine-grain steels … FM6 nickel alloys). */
export const isoFillerGroups = {
  1: 'FM1 · non-alloy and fine-grain steels',
  2: 'FM2 · high-strength steels',
  3: 'FM3 · creep-resisting steels, Cr < 3.75 %',
  4: 'FM4 · creep-resisting steels, 3.75 % ≤ Cr ≤ 12 %',
  5: 'FM5 · stainless and heat-resisting steels',
  6: 'FM6 · nickel and nickel alloys',
} as const satisfies Record<number, string>
export const isoFillerGroupIds = ['1', '2', '3', '4', '5', '6'] as const

/** Filler material types (ISO 9606-1 Table 4 and 5.6, from memory): covered electrodes, wires and rods, none. */
export const isoFillerTypes = {
  nm: 'no filler metal',
  A: 'acid covering',
  RA: 'rutile-acid covering',
  RB: 'rutile-basic covering',
  RC: 'rutile-cellulosic covering',
  RR: 'rutile thick covering',
  R: 'rutile covering, or rutile-cored wire',
  B: 'basic covering, or basic-cored wire',
  C: 'cellulosic covering',
  S: 'solid wire or rod',
  M: 'metal-cored wire',
  P: 'rutile-cored wire, fast-freezing slag',
  V: 'rutile or basic/fluoride-cored wire',
  W: 'basic/fluoride-cored wire, slow-freezing slag',
  Y: 'basic/fluoride-cored wire, fast-freezing slag',
  Z: 'other cored wire',
} as const satisfies Record<string, string>
export const isoFillerTypeIds = Object.keys(isoFillerTypes) as (keyof typeof isoFillerTypes)[]

/** Weld details of a butt weld (ISO 9606-1, 5.9 and the designation, clause 10). */
export const isoButtDetails = {
  'ss nb': 'single side, no backing',
  'ss mb': 'single side, with backing',
  'bs': 'both sides',
} as const
export const isoButtDetailIds = ['ss nb', 'ss mb', 'bs'] as const
/** Layers of a fillet weld (ISO 9606-1, 5.9): sl single layer, ml multi-layer. */
export const isoLayerings = { sl: 'single layer', ml: 'multi-layer' } as const
export const isoLayeringIds = ['sl', 'ml'] as const
/** Back gouging or back grinding of a weld welded from both sides (designation: gg with, ng without; from memory). */
export const isoGougings = { gg: 'back gouged or ground', ng: 'not back gouged' } as const

/** Methods of test (ISO 9606-1, 6.4 and Table 11, from memory), with the standards that describe them. */
export const isoTestMethods = {
  VT: 'visual testing (ISO 17637)',
  RT: 'radiographic testing (ISO 17636-1)',
  UT: 'ultrasonic testing (ISO 17640)',
  BT: 'bend test (ISO 5173)',
  FT: 'fracture test (ISO 9017)',
  MA: 'macroscopic examination (ISO 17639)',
} as const
export const isoTestMethodIds = ['VT', 'RT', 'UT', 'BT', 'FT', 'MA'] as const

/** The revalidation routes of ISO 9606-1, 9.3 (EN ISO 9606-1:2017 adds c). */
export const isoRevalidationRoutes = {
  a: '9.3 a) retest every 3 years',
  b: '9.3 b) every 2 years, two production welds tested in the last 6 months of validity',
  c: '9.3 c) no end date while the 9.2 confirmations continue and the manufacturer (ISO 3834-2) keeps evidence of acceptable quality',
} as const
export const isoRevalidationRouteIds = ['a', 'b', 'c'] as const
export type IsoRevalidationRoute = typeof isoRevalidationRouteIds[number]

/** Who signs a 9.2 confirmation (the employer's welding coordinator or the examiner / examining body). */
export const isoConfirmers = { coordinator: 'welding coordinator', examiner: 'examiner or examining body' } as const
export const isoConfirmerIds = ['coordinator', 'examiner'] as const
/** What an ISO validity record is: a 9.2 confirmation, or the 9.3 b) record of two production welds tested. */
export const isoValidityKinds = { 'confirmation': '9.2 six-monthly confirmation', 'production-welds': '9.3 b) production welds tested' } as const
export const isoValidityKindIds = ['confirmation', 'production-welds'] as const

/** Whether a stored code is the ISO welder standard (the code family ISO standings are kept in). */
export const isIsoWelderCode = (code: string) => code === 'iso-9606-1'

/**
 * A procedure (WPS or PQR/WPQR) is never "ISO 9606-1": that is the welder standard. Procedures recorded with the ISO code
 * are read as ISO 15614-1 (procedure test, WPQR) and ISO 15609-1 (WPS content). The stored code stays as it was, so
 * signed procedures keep verifying; only the words change.
 */
export function procedureCodeTitle(code: string, record: 'wps' | 'pqr', fallback: (code: string) => string): string {
  if (!isIsoWelderCode(code) && code !== 'iso-15614-1') return fallback(code)
  return record === 'wps' ? 'ISO 15609-1 (WPS), qualified to ISO 15614-1' : 'ISO 15614-1 (WPQR)'
}
export function procedureCodeShortName(code: string, fallback: (code: string) => string): string {
  return isIsoWelderCode(code) || code === 'iso-15614-1' ? 'ISO 15614-1' : fallback(code)
}
