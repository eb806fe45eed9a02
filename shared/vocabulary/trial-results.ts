// How a bead is judged at the machine: a short scale by eye and ear, and the checks for what must not be there.

export const trialScale = ['good', 'fair', 'poor'] as const
export type TrialScale = typeof trialScale[number]
export const trialScaleWords: Record<TrialScale, string> = { good: 'good', fair: 'fair', poor: 'poor' }

/** What each scale judges, in the order the form asks. */
export const trialScaleItems = [
  { key: 'wetting', label: 'Wetting', help: 'how the bead flows into the toes' },
  { key: 'spatter', label: 'Spatter', help: 'good: little or none' },
  { key: 'arcSound', label: 'Arc sound', help: 'good: a steady crackle' },
] as const

/** A tick means the discontinuity was seen. */
export const trialDefectItems = [
  { key: 'porosity', label: 'Porosity' },
  { key: 'undercut', label: 'Undercut' },
  { key: 'meltThrough', label: 'Melt-through' },
  { key: 'lackOfFusion', label: 'Lack of fusion' },
] as const

export const backPenetrationValues = ['full', 'partial', 'none'] as const
export type BackPenetration = typeof backPenetrationValues[number]
export const backPenetrationWords: Record<BackPenetration, string> = { full: 'full on the back', partial: 'partial', none: 'none' }
