// The words of a project's weld register: joint types, examination methods, indication types, layers.

/** How the members meet (the weld itself is a groove or a fillet weld, kept apart). */
export const jointTypes = ['butt', 'corner', 'tee', 'lap', 'edge', 'branch', 'socket'] as const
export type JointType = typeof jointTypes[number]
export const jointTypeWords: Record<JointType, string> = {
  butt: 'Butt', corner: 'Corner', tee: 'Tee', lap: 'Lap', edge: 'Edge', branch: 'Branch connection', socket: 'Socket',
}

/** Examination methods recorded per joint: visual, radiography, ultrasonic, magnetic particle, liquid penetrant. */
export const examinationMethods = ['VT', 'RT', 'UT', 'MT', 'PT'] as const
export type ExaminationMethod = typeof examinationMethods[number]
export const examinationWords: Record<ExaminationMethod, string> = {
  VT: 'Visual (VT)', RT: 'Radiography (RT)', UT: 'Ultrasonic (UT)', MT: 'Magnetic particle (MT)', PT: 'Liquid penetrant (PT)',
}
/** Volumetric methods: their results carry the length examined and, when rejected, the indication's type and length. */
export const volumetricMethods = ['RT', 'UT'] as const satisfies readonly ExaminationMethod[]

/** Indication types a volumetric examination rejects a weld for. */
export const defectTypes = ['crack', 'incomplete-fusion', 'incomplete-penetration', 'porosity', 'slag', 'undercut', 'burn-through', 'tungsten', 'other'] as const
export type DefectType = typeof defectTypes[number]
export const defectWords: Record<DefectType, string> = {
  'crack': 'Crack', 'incomplete-fusion': 'Incomplete fusion', 'incomplete-penetration': 'Incomplete penetration', 'porosity': 'Porosity',
  'slag': 'Slag inclusion', 'undercut': 'Undercut', 'burn-through': 'Burn-through', 'tungsten': 'Tungsten inclusion', 'other': 'Other',
}

/** Where in the joint a welder's process went. */
export const jointLayers = ['all', 'root', 'hot-pass', 'fill', 'cap', 'back-weld'] as const
export type JointLayer = typeof jointLayers[number]
export const layerWords: Record<JointLayer, string> = {
  'all': 'All layers', 'root': 'Root', 'hot-pass': 'Hot pass', 'fill': 'Fill', 'cap': 'Cap', 'back-weld': 'Back weld',
}

/** R1, R2...: a repair's short name; 0 is the original weld. */
export const repairName = (repair: number) => (repair === 0 ? 'Original' : `R${repair}`)

/** What an API token may write. */
export const tokenScopes = ['joints:write', 'continuity:write'] as const
export type TokenScope = typeof tokenScopes[number]
