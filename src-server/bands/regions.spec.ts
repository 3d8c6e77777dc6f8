import { ISO_3166_ALPHA2, REGION_GROUPS, REGIONS, RENAMED_REGIONS, countriesOf, regionGoverns, regionsOverlap } from './regions';

describe('regions', () => {
  it('holds the 249 ISO 3166-1 alpha-2 codes, where AS is American Samoa and UK is not assigned', () => {
    // ISO 3166-1 (iso-codes 4.15): 249 assigned alpha-2 codes; UK is only "exceptionally reserved" for GB.
    expect(ISO_3166_ALPHA2).toHaveLength(249);
    expect(ISO_3166_ALPHA2).toContain('AS');
    expect(ISO_3166_ALPHA2).toContain('GB');
    expect(ISO_3166_ALPHA2).not.toContain('UK');
    expect(REGIONS).not.toContain('UK');
  });

  it('names groupings so none reads as a country: EU (reserved by ISO 3166-1 for the Union) and longer names', () => {
    for (const group of Object.keys(REGION_GROUPS)) expect(group === 'EU' || group.length > 2).toBe(true);
    // The EU has 27 member states since 2020 (from memory).
    expect(REGION_GROUPS.EU).toHaveLength(27);
    expect(RENAMED_REGIONS).toEqual([
      ['AS', 'ASIA'],
      ['UK', 'GB'],
    ]);
  });

  it('says where a band is used: an EU band in Germany and in CEPT, not in the US; global everywhere', () => {
    expect(regionsOverlap('EU', 'DE')).toBe(true);
    expect(regionsOverlap('EU', 'CEPT')).toBe(true);
    expect(regionsOverlap('EU', 'US')).toBe(false);
    expect(regionsOverlap('global', 'AS')).toBe(true);
    expect(regionsOverlap('ASIA', 'AS')).toBe(false);
    expect(countriesOf('global').size).toBe(249);
  });

  it('lets a limit govern a market only where it holds in every country of it', () => {
    expect(regionGoverns('EU', 'DE')).toBe(true);
    expect(regionGoverns('EU', 'EU')).toBe(true);
    expect(regionGoverns('EU', 'CEPT')).toBe(false);
    expect(regionGoverns('EU', 'GB')).toBe(false);
    expect(regionGoverns('global', 'US')).toBe(true);
    expect(regionGoverns('US', 'CA')).toBe(false);
  });
});
