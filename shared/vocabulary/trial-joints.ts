// The joints a trial series is run on, from the first beads on a plate to the real joint.

export const trialJointKinds = ['bead-on-plate', 'fillet', 'outside-corner', 'lap', 'butt', 'edge'] as const
export type TrialJointKind = typeof trialJointKinds[number]

export const trialJointWords: Record<TrialJointKind, string> = {
  'bead-on-plate': 'Bead on plate',
  'fillet': 'Fillet (tee)',
  'outside-corner': 'Outside corner',
  'lap': 'Lap',
  'butt': 'Butt (square groove)',
  'edge': 'Edge',
}
