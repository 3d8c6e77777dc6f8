/** Vocabulary of the band library, shared by bands, radios and regulatory limits. */
export const TECHNOLOGIES = ['lte', 'nr', 'gnss', 'wifi', 'ble', 'ism', 'uwb', 'other'] as const;
export type Technology = (typeof TECHNOLOGIES)[number];

export const RANGE_ROLES = ['uplink', 'downlink', 'tdd', 'receive', 'transmit-receive'] as const;
export type RangeRole = (typeof RANGE_ROLES)[number];

export const DUPLEX_MODES = ['FDD', 'TDD', 'receive-only', 'half-duplex'] as const;
export type DuplexMode = (typeof DUPLEX_MODES)[number];

/** Market and regulatory regions: ISO 3166-1 alpha-2 codes, named groupings (EU, CEPT, ASIA) and global; see regions.ts. */
export { REGIONS, type Region } from './regions';

/** Technologies whose radios only listen; they have no transmit power and no certified gain limit. */
export const RECEIVE_ONLY_TECHNOLOGIES: readonly Technology[] = ['gnss'];

/** Which part of a GNSS signal a receiver needs: the main lobe of the open-service signal, or the full signal band. */
export const GNSS_BANDWIDTHS = ['main-lobe', 'full-band'] as const;
export type GnssBandwidth = (typeof GNSS_BANDWIDTHS)[number];
export const DEFAULT_GNSS_BANDWIDTH: GnssBandwidth = 'main-lobe';
