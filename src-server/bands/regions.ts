/**
 * Markets and regulatory regions. A region is an ISO 3166-1 alpha-2 country code, a named grouping of
 * countries, or `global`. Groupings are never two letters except `EU`, which ISO 3166-1 reserves
 * for the European Union, so a grouping can never be read as a country (the old `AS` for Asia is
 * American Samoa in ISO 3166-1; it is `ASIA` now, and the old `UK` is `GB`).
 */

/** ISO 3166-1 alpha-2, all 249 assigned codes (from the iso-codes 4.15 data, a copy of the ISO 3166 Maintenance Agency list). */
// prettier-ignore
export const ISO_3166_ALPHA2 = [
  'AD', 'AE', 'AF', 'AG', 'AI', 'AL', 'AM', 'AO', 'AQ', 'AR', 'AS', 'AT', 'AU', 'AW', 'AX', 'AZ', 'BA', 'BB', 'BD', 'BE',
  'BF', 'BG', 'BH', 'BI', 'BJ', 'BL', 'BM', 'BN', 'BO', 'BQ', 'BR', 'BS', 'BT', 'BV', 'BW', 'BY', 'BZ', 'CA', 'CC', 'CD',
  'CF', 'CG', 'CH', 'CI', 'CK', 'CL', 'CM', 'CN', 'CO', 'CR', 'CU', 'CV', 'CW', 'CX', 'CY', 'CZ', 'DE', 'DJ', 'DK', 'DM',
  'DO', 'DZ', 'EC', 'EE', 'EG', 'EH', 'ER', 'ES', 'ET', 'FI', 'FJ', 'FK', 'FM', 'FO', 'FR', 'GA', 'GB', 'GD', 'GE', 'GF',
  'GG', 'GH', 'GI', 'GL', 'GM', 'GN', 'GP', 'GQ', 'GR', 'GS', 'GT', 'GU', 'GW', 'GY', 'HK', 'HM', 'HN', 'HR', 'HT', 'HU',
  'ID', 'IE', 'IL', 'IM', 'IN', 'IO', 'IQ', 'IR', 'IS', 'IT', 'JE', 'JM', 'JO', 'JP', 'KE', 'KG', 'KH', 'KI', 'KM', 'KN',
  'KP', 'KR', 'KW', 'KY', 'KZ', 'LA', 'LB', 'LC', 'LI', 'LK', 'LR', 'LS', 'LT', 'LU', 'LV', 'LY', 'MA', 'MC', 'MD', 'ME',
  'MF', 'MG', 'MH', 'MK', 'ML', 'MM', 'MN', 'MO', 'MP', 'MQ', 'MR', 'MS', 'MT', 'MU', 'MV', 'MW', 'MX', 'MY', 'MZ', 'NA',
  'NC', 'NE', 'NF', 'NG', 'NI', 'NL', 'NO', 'NP', 'NR', 'NU', 'NZ', 'OM', 'PA', 'PE', 'PF', 'PG', 'PH', 'PK', 'PL', 'PM',
  'PN', 'PR', 'PS', 'PT', 'PW', 'PY', 'QA', 'RE', 'RO', 'RS', 'RU', 'RW', 'SA', 'SB', 'SC', 'SD', 'SE', 'SG', 'SH', 'SI',
  'SJ', 'SK', 'SL', 'SM', 'SN', 'SO', 'SR', 'SS', 'ST', 'SV', 'SX', 'SY', 'SZ', 'TC', 'TD', 'TF', 'TG', 'TH', 'TJ', 'TK',
  'TL', 'TM', 'TN', 'TO', 'TR', 'TT', 'TV', 'TW', 'TZ', 'UA', 'UG', 'UM', 'US', 'UY', 'UZ', 'VA', 'VC', 'VE', 'VG', 'VI',
  'VN', 'VU', 'WF', 'WS', 'YE', 'YT', 'ZA', 'ZM', 'ZW',
] as const;

/**
 * Named groupings and their members (ISO codes). Membership as of 2025, from memory: check the body's own list
 * before relying on it.
 * - EU: the 27 member states of the European Union (RED and the EU spectrum decisions; the EEA countries IS, LI
 *   and NO apply them too but are not members here: name them as markets of their own).
 * - CEPT: the 46 administrations of the European Conference of Postal and Telecommunications Administrations
 *   (ERC/REC 70-03 applies where an administration implements it; Russia's participation is suspended and left out).
 * - ASIA: the countries of the UN M49 region Asia (code 142), plus TW; used for regional plans such as LoRaWAN AS923.
 */
// prettier-ignore
export const REGION_GROUPS = {
  EU: ['AT', 'BE', 'BG', 'CY', 'CZ', 'DE', 'DK', 'EE', 'ES', 'FI', 'FR', 'GR', 'HR', 'HU', 'IE', 'IT', 'LT', 'LU', 'LV', 'MT', 'NL', 'PL', 'PT', 'RO', 'SE', 'SI', 'SK'],
  CEPT: [
    'AD', 'AL', 'AT', 'AZ', 'BA', 'BE', 'BG', 'CH', 'CY', 'CZ', 'DE', 'DK', 'EE', 'ES', 'FI', 'FR', 'GB', 'GE', 'GR', 'HR', 'HU', 'IE', 'IS', 'IT',
    'LI', 'LT', 'LU', 'LV', 'MC', 'MD', 'ME', 'MK', 'MT', 'NL', 'NO', 'PL', 'PT', 'RO', 'RS', 'SE', 'SI', 'SK', 'SM', 'TR', 'UA', 'VA',
  ],
  ASIA: [
    'AE', 'AF', 'AM', 'AZ', 'BD', 'BH', 'BN', 'BT', 'CN', 'CY', 'GE', 'HK', 'ID', 'IL', 'IN', 'IQ', 'IR', 'JO', 'JP', 'KG', 'KH', 'KP', 'KR', 'KW',
    'KZ', 'LA', 'LB', 'LK', 'MM', 'MN', 'MO', 'MV', 'MY', 'NP', 'OM', 'PH', 'PK', 'PS', 'QA', 'SA', 'SG', 'SY', 'TH', 'TJ', 'TL', 'TM', 'TR', 'TW',
    'UZ', 'VN', 'YE',
  ],
} as const satisfies Record<string, readonly (typeof ISO_3166_ALPHA2)[number][]>;

export type RegionGroup = keyof typeof REGION_GROUPS;
export const GLOBAL_REGION = 'global';

/** Every region a band, limit or product may name: global, the groupings, then the ISO codes. */
export const REGIONS = [GLOBAL_REGION, ...(Object.keys(REGION_GROUPS) as RegionGroup[]), ...ISO_3166_ALPHA2] as const;
export type Region = (typeof REGIONS)[number];

/** The validation message for a region value: the list itself is too long to quote. */
export const REGION_MESSAGE = 'each value must be an ISO 3166-1 alpha-2 country code (GB, US, DE …), a grouping (EU, CEPT, ASIA) or global';

/** Codes an earlier version stored, and what they are now (migration 1765520000000 rewrites them). */
export const RENAMED_REGIONS: readonly (readonly [string, Region])[] = [
  ['AS', 'ASIA'],
  ['UK', 'GB'],
];

const ALL_COUNTRIES: ReadonlySet<string> = new Set(ISO_3166_ALPHA2);
const isGroup = (region: string): region is RegionGroup => Object.prototype.hasOwnProperty.call(REGION_GROUPS, region);

/** The countries a region stands for: global every one, a grouping its members, a country itself. */
export function countriesOf(region: string): ReadonlySet<string> {
  if (region === GLOBAL_REGION) return ALL_COUNTRIES;
  if (isGroup(region)) return new Set(REGION_GROUPS[region]);
  return new Set([region]);
}

/** Whether two regions share a country (a band of `EU` is used in the market `DE`, and in the market `CEPT`). */
export function regionsOverlap(a: string, b: string): boolean {
  const [small, large] = [countriesOf(a), countriesOf(b)].sort((x, y) => x.size - y.size);
  for (const country of small) if (large.has(country)) return true;
  return false;
}

/** Whether a limit made for `governing` holds in every country of `market` (an `EU` limit governs `DE` and `EU`, not `CEPT`). */
export function regionGoverns(governing: string, market: string): boolean {
  const within = countriesOf(governing);
  for (const country of countriesOf(market)) if (!within.has(country)) return false;
  return true;
}
