// Test positions a trial is run in (ASME IX QW-461.4 plate groove 1G–4G, QW-461.5 plate fillet 1F–4F), and the
// position letter a WPS states for each (F flat, H horizontal, V vertical, O overhead).

export const trialPositions = ['1G', '2G', '3G', '4G', '1F', '2F', '3F', '4F'] as const
export type TrialPosition = typeof trialPositions[number]

export const positionLetterOf: Record<TrialPosition, 'F' | 'H' | 'V' | 'O'> = {
  '1G': 'F', '2G': 'H', '3G': 'V', '4G': 'O', '1F': 'F', '2F': 'H', '3F': 'V', '4F': 'O',
}
