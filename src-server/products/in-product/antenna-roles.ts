/** The antennas a radio can need: one main, then diversity or further MIMO branches. */
export const ANTENNA_ROLES = ['main', 'diversity', 'mimo-2', 'mimo-3', 'mimo-4'] as const;
export type AntennaRole = (typeof ANTENNA_ROLES)[number];
