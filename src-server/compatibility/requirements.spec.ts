import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { loadRuleFiles } from './rule-files';
import { CompiledRuleSet } from './engine/compiled-evaluator';
import { computeFacts } from './engine/compute-facts';
import { constructedPart, MHZ } from './engine/fixtures';
import { requirementsOf } from './evaluation-inputs.service';
import type { LimitOnFile } from '../regulatory/markets';
import type { ProductDetailDto } from '../products/dto/product.dto';

const SEED_LIMITS: LimitOnFile[] = JSON.parse(readFileSync(resolve('catalog-seed/regulatory-limits.json'), 'utf8'));
const SEED_BANDS: { id: number; designation: string; ranges: { role: string; fromMhz: number; toMhz: number }[]; regions: string[]; mainLobe?: unknown }[] =
  JSON.parse(readFileSync(resolve('catalog-seed/bands.json'), 'utf8'));

function band(designation: string) {
  const b = SEED_BANDS.find((x) => x.designation === designation)!;
  return { ...b, mainLobe: b.mainLobe ?? null };
}

function productWith(radio: Record<string, unknown>, targetRegions = ['EU', 'US']): ProductDetailDto {
  return {
    id: 1,
    targetRegions,
    groundPlaneLengthMm: 140,
    groundPlaneWidthMm: 90,
    radios: [{ id: 1, name: 'radio', transmitPowerDbm: 23, receiveOnly: false, polarization: 'linear', feedLossDb: 0, gnssBandwidth: null, ...radio }],
  } as unknown as ProductDetailDto;
}

const RULES = new CompiledRuleSet(loadRuleFiles());

describe('requirementsOf', () => {
  it('judges a GNSS radio on the main lobe by default and on the full band when it needs it', () => {
    const gnss = (gnssBandwidth: string) =>
      requirementsOf(
        productWith({
          technology: 'gnss',
          transmitPowerDbm: null,
          receiveOnly: true,
          polarization: 'RHCP',
          gnssBandwidth,
          bands: [{ band: band('GPS L1'), certifiedMaxGainDbi: null, channels: null }],
        }),
        SEED_LIMITS,
      )[0];
    // IS-GPS-200 §3.3.1.1: C/A main lobe 1575.42 ± 1.023 MHz; the L1 band 1575.42 ± 10.23 MHz (from memory).
    const lobe = gnss('main-lobe').ranges;
    expect(lobe).toHaveLength(1);
    expect(lobe[0].fromHz / MHZ).toBeCloseTo(1574.397, 6);
    expect(lobe[0].toHz / MHZ).toBeCloseTo(1576.443, 6);
    expect(gnss('full-band').ranges.map((r) => [r.fromHz / MHZ, r.toHz / MHZ])).toEqual([[1565.19, 1585.65]]);

    // A patch matched at VSWR 2 over 1573–1578 MHz covers the C/A main lobe, not the 20.46 MHz band.
    const patch = constructedPart({ fromHz: 1573 * MHZ, toHz: 1578 * MHZ, vswr: 2 }, { polarization: 'RHCP' });
    const covered = RULES.evaluate(computeFacts(gnss('main-lobe'), patch));
    expect(covered.findings.map((f) => f.code)).not.toContain('BAND_NOT_COVERED');
    const full = computeFacts(gnss('full-band'), patch);
    expect(full.coverageAtVswr3Pct).toBeNull();
  });

  it('hands an LTE B8 uplink only the limits of its service: the EU power class, never 47 CFR 15.247 (902–928 MHz)', () => {
    const [b8] = requirementsOf(productWith({ technology: 'lte', bands: [{ band: band('B8'), certifiedMaxGainDbi: 5, channels: null }] }), SEED_LIMITS);
    // B8 (3GPP TS 36.101 Table 5.5-1) is used in the EU, not the US, in the library.
    expect(b8.markets).toEqual(['EU']);
    expect(b8.regulatoryLimits.length).toBeGreaterThan(0);
    expect(b8.regulatoryLimits.every((l) => l.source.startsWith('3GPP TS 36.101') && l.region === 'EU')).toBe(true);
    const facts = computeFacts(b8, constructedPart({ gainDbi: 2 }));
    expect(facts.regionalLimitKind).toBe('conducted');
    expect(facts.regionalLimitRegion).toBe('EU');

    const [us915] = requirementsOf(
      productWith({ technology: 'ism', transmitPowerDbm: 30, bands: [{ band: band('US902-928'), certifiedMaxGainDbi: 6, channels: null }] }),
      SEED_LIMITS,
    );
    const ism = computeFacts(us915, constructedPart({ gainDbi: 2 }));
    expect(ism.regionalLimitSource).toBe('47 CFR 15.247(b)(3), (b)(4)');
    // 15.247(b)(3): 30 dBm conducted; 2 dBi is below the 6 dBi threshold, so no reduction: margin 0 dB.
    expect(ism.regionalLimitMarginDb).toBe(0);
  });

  it('passes the channels a radio lists to the engine in Hz', () => {
    const [eu868] = requirementsOf(
      productWith(
        {
          technology: 'ism',
          transmitPowerDbm: 20,
          bands: [{ band: band('EU863-870'), certifiedMaxGainDbi: 3, channels: [{ fromMhz: 869.4, toMhz: 869.65 }] }],
        },
        ['EU'],
      ),
      SEED_LIMITS,
    );
    expect(eu868.channels).toEqual([{ fromHz: 869.4 * MHZ, toHz: 869.65 * MHZ }]);
    // ERC/REC 70-03 Annex 1: 869.4–869.65 MHz, 500 mW e.r.p. = 26.99 dBm.
    expect(computeFacts(eu868, constructedPart({ gainDbi: 2.15 })).regionalLimitDbm as number).toBeCloseTo(26.99, 2);
  });
});
