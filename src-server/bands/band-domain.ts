/** Vocabulary of the band library, shared by bands, radios and regulatory limits. */
export const TECHNOLOGIES = ['lte', 'nr', 'gnss', 'wifi', 'ble', 'ism', 'uwb', 'other'] as const;
export type Technology = (typeof TECHNOLOGIES)[number];

export const RANGE_ROLES = ['uplink', 'downlink', 'tdd', 'receive', 'transmit-receive'] as const;
export type RangeRole = (typeof RANGE_ROLES)[number];

export const DUPLEX_MODES = ['FDD', 'TDD', 'receive-only', 'half-duplex'] as const;
export type DuplexMode = (typeof DUPLEX_MODES)[number];

/** Market and regulatory regions: ISO-like codes plus EU (CEPT/ETSI) and global. */
export const REGIONS = ['global', 'EU', 'UK', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN', 'AS'] as const;
export type Region = (typeof REGIONS)[number];

/** Technologies whose radios only listen; they have no transmit power and no certified gain limit. */
export const RECEIVE_ONLY_TECHNOLOGIES: readonly Technology[] = ['gnss'];
