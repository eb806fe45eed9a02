/** What a piece of shop equipment is: a welding machine, or a meter used to set and check one. */
export const equipmentKinds = ['welding-machine', 'ammeter', 'voltmeter', 'wire-feed-speed-meter', 'gas-flow-meter', 'temperature-indicator'] as const
export type EquipmentKind = typeof equipmentKinds[number]

export const equipmentKindWords: Record<EquipmentKind, string> = {
  'welding-machine': 'Welding machine',
  'ammeter': 'Ammeter',
  'voltmeter': 'Voltmeter',
  'wire-feed-speed-meter': 'Wire feed speed meter',
  'gas-flow-meter': 'Gas flow meter',
  'temperature-indicator': 'Temperature-indicating device',
}

export const equipmentKindChoices = equipmentKinds.map(value => ({ value, label: equipmentKindWords[value] }))

/** Whether the equipment is in use on the shop floor. */
export const equipmentStates = ['in-service', 'out-of-service'] as const
export type EquipmentState = typeof equipmentStates[number]
export const equipmentStateWords: Record<EquipmentState, string> = { 'in-service': 'In service', 'out-of-service': 'Out of service' }
