import { regionGoverns, regionsOverlap } from '../bands/regions';
import type { Finding, RegulatoryLimit } from '../compatibility/engine/types';

/** The finding codes of the market check (issue 12): a band no target market uses, a market a radio cannot serve. */
export const MARKET_FINDING_CODES = { bandOutsideMarkets: 'BAND_OUTSIDE_MARKETS', marketWithoutBands: 'MARKET_WITHOUT_BANDS' } as const;
export const MARKET_CHECK_ID = 'target-markets';

/**
 * The product's markets in which a band is used (its regions share a country with the market); every market when
 * the band states no regions, since then nothing is known against it.
 */
export function marketsUsingBand(bandRegions: readonly string[], markets: readonly string[]): string[] {
  if (bandRegions.length === 0) return [...markets];
  return markets.filter((market) => bandRegions.some((region) => regionsOverlap(region, market)));
}

/** A limit as stored, in MHz, with the technologies (services) it governs. */
export interface LimitOnFile {
  readonly region: string;
  readonly technologies: readonly string[];
  readonly fromMhz: number;
  readonly toMhz: number;
  readonly kind: RegulatoryLimit['kind'];
  readonly valueDbm: number;
  readonly source: string;
  readonly gainThresholdDbi: number | null;
  readonly reductionDbPerDb: number | null;
}

/**
 * The limits that judge one radio band: those that govern the radio's technology and at least one of the markets
 * the band is used in, each naming the markets it governs (47 CFR 15.247 governs a LoRa radio at 915 MHz, not a
 * licensed LTE uplink in 880–915 MHz).
 */
export function limitsFor(technology: string, markets: readonly string[], limits: readonly LimitOnFile[]): RegulatoryLimit[] {
  return limits.flatMap((limit) => {
    if (!limit.technologies.includes(technology)) return [];
    const governed = markets.filter((market) => regionGoverns(limit.region, market));
    if (governed.length === 0) return [];
    return [
      {
        region: limit.region,
        fromHz: limit.fromMhz * 1e6,
        toHz: limit.toMhz * 1e6,
        kind: limit.kind,
        valueDbm: limit.valueDbm,
        source: limit.source,
        gainThresholdDbi: limit.gainThresholdDbi,
        reductionDbPerDb: limit.reductionDbPerDb,
        markets: governed,
      },
    ];
  });
}

export interface MarketCheckRadio {
  readonly id: number;
  readonly name: string;
  readonly bands: readonly { readonly band: { readonly id: number; readonly designation: string; readonly regions: readonly string[] } }[];
}

export interface MarketFindings {
  /** Per radio band: info when none of the product's markets uses the band. */
  readonly rows: readonly { readonly radioId: number; readonly bandId: number; readonly findings: readonly Finding[] }[];
  /** Per radio: a market none of its bands is used in (only said when every band states its regions). */
  readonly radios: readonly { readonly radioId: number; readonly findings: readonly Finding[] }[];
}

/** Bands against markets: what a product's radios cover of its target markets. */
export function marketFindings(targetRegions: readonly string[], radios: readonly MarketCheckRadio[]): MarketFindings {
  const rows = radios.flatMap((radio) =>
    radio.bands.map(({ band }) => {
      const outside = band.regions.length > 0 && marketsUsingBand(band.regions, targetRegions).length === 0;
      const findings: Finding[] = outside
        ? [
            {
              ruleId: MARKET_CHECK_ID,
              severity: 'info',
              code: MARKET_FINDING_CODES.bandOutsideMarkets,
              message: `${band.designation} is used in ${band.regions.join(', ')}, none of the product's markets (${targetRegions.join(', ')})`,
            },
          ]
        : [];
      return { radioId: radio.id, bandId: band.id, findings };
    }),
  );
  const perRadio = radios.map((radio) => {
    const known = radio.bands.length > 0 && radio.bands.every(({ band }) => band.regions.length > 0);
    const unserved = known ? targetRegions.filter((market) => !radio.bands.some(({ band }) => marketsUsingBand(band.regions, [market]).length > 0)) : [];
    const findings: Finding[] = unserved.map((market) => ({
      ruleId: MARKET_CHECK_ID,
      severity: 'marginal',
      code: MARKET_FINDING_CODES.marketWithoutBands,
      message: `${radio.name} has no band used in ${market}, one of the product's markets; check that the radio can serve it`,
    }));
    return { radioId: radio.id, findings };
  });
  return { rows, radios: perRadio };
}
