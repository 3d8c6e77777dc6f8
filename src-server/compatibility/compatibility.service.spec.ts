import type { DataSource } from 'typeorm';
import type { PartDataService, PartEvaluationData } from '../parts/part-data.service';
import type { ProductsService } from '../products/products.service';
import type { RegulatoryLimitsService } from '../regulatory/regulatory-limits.service';
import { CandidatesService } from './candidates.service';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { MatrixService } from './matrix.service';
import { CompiledRuleSet } from './engine/compiled-evaluator';
import type { RuleDefinition } from './engine/rule-definition';
import { loadRuleFiles } from './rule-files';
import type { RulesService } from './rules.service';
import type { OffersReader } from './sourcing/offers-reader.service';

/**
 * Two requests on one server interleaved by hand: A read catalogue revision 1 and is still loading part
 * data; a write bumps the revision to 2; B reads 2. Nothing A loaded may reach a caller of revision 2.
 */

function deferred<T>() {
  let resolve!: (value: T) => void;
  const promise = new Promise<T>((ok) => (resolve = ok));
  return { promise, resolve };
}
const settle = () => new Promise((done) => setImmediate(done));

const PRODUCT = 1;
const RADIO = 11;
const PART = 7;

/** Before the write: a draft with no data. After: the same part, approved, with a datasheet band over BLE. */
function part(version: 'old' | 'new'): PartEvaluationData {
  return {
    id: PART,
    manufacturer: 'Testbench',
    mpn: `MPN-${version}`,
    title: 'chip',
    formFactor: 'chip',
    connector: 'solder-pad',
    polarization: 'linear',
    lifecycle: 'active',
    reviewState: version === 'old' ? 'draft' : 'approved',
    nominalImpedanceOhms: 50,
    evalGroundPlane: null,
    specBands:
      version === 'old' ? [] : [{ fromHz: 2.3e9, toHz: 2.6e9, maxVswr: 2, minReturnLossDb: null, efficiencyPct: 60, peakGainDbi: 1, averageGainDbi: null }],
    s11: null,
    efficiency: null,
    peakGain: null,
    averageGain: null,
  } as PartEvaluationData;
}

const product = {
  id: PRODUCT,
  name: 'probe',
  targetRegions: ['EU'],
  groundPlaneLengthMm: 60,
  groundPlaneWidthMm: 30,
  radios: [
    {
      id: RADIO,
      name: 'BLE',
      technology: 'ble',
      receiveOnly: false,
      transmitPowerDbm: 8,
      polarization: 'linear',
      connector: 'solder-pad',
      feedLossDb: 0,
      bands: [
        { band: { id: 3, designation: 'BLE 2.4 GHz', regions: ['global'], ranges: [{ fromMhz: 2400, toMhz: 2483.5, role: 'tdd' }] }, certifiedMaxGainDbi: 3 },
      ],
    },
  ],
};

function harness() {
  const state = { revision: 1 };
  const partLoads: ReturnType<typeof deferred<PartEvaluationData[]>>[] = [];
  const catalogueLoads: ReturnType<typeof deferred<PartEvaluationData[]>>[] = [];
  const rules = loadRuleFiles();
  const compiled = new CompiledRuleSet(rules);
  const dataSource = {
    query: async (sql: string) => {
      if (sql.includes('FROM catalogue_revision')) return [{ revision: state.revision }];
      throw new Error(`unexpected query ${sql}`);
    },
    getRepository: () => ({ find: async () => [] }),
  } as unknown as DataSource;
  const rulesService = { compile: () => compiled, currentRuleSet: async () => ({ rules, compiled, signature: 'rules' }) } as unknown as RulesService;
  const productsService = { getWithRadios: async () => product } as unknown as ProductsService;
  const inputs = new EvaluationInputsService(
    dataSource,
    {
      getPartData: () => {
        const load = deferred<PartEvaluationData[]>();
        partLoads.push(load);
        return load.promise;
      },
      loadCatalogueForEvaluation: () => {
        const load = deferred<PartEvaluationData[]>();
        catalogueLoads.push(load);
        return load.promise;
      },
    } as unknown as PartDataService,
    // ETSI EN 300 328: 20 dBm e.i.r.p. at 2.4 GHz, so the band has a limit on file for its market.
    {
      list: async () => [
        {
          region: 'EU',
          technologies: ['ble'],
          fromMhz: 2400,
          toMhz: 2483.5,
          kind: 'eirp',
          valueDbm: 20,
          source: 'ETSI EN 300 328',
          gainThresholdDbi: null,
          reductionDbPerDb: null,
        },
      ],
    } as unknown as RegulatoryLimitsService,
  );
  // The services share one EvaluationInputsService, as under Nest, so they share its caches.
  const matrices = new MatrixService(dataSource, rulesService, productsService, inputs);
  const ranking = new CandidatesService(dataSource, rulesService, productsService, inputs, { allAt: async () => new Map() } as unknown as OffersReader);
  const service = { matrix: matrices.matrix.bind(matrices), candidates: ranking.candidates.bind(ranking) };
  return { service, state, partLoads, catalogueLoads, rules };
}

describe('Compatibility caches across a catalogue write', () => {
  it('a matrix column loaded before the write is not served after it', async () => {
    const { service, state, partLoads, rules } = harness();
    const before = service.matrix(PRODUCT, { partIds: [PART] }, rules as RuleDefinition[]);
    await settle();
    state.revision = 2;
    const after = service.matrix(PRODUCT, { partIds: [PART] }, rules as RuleDefinition[]);
    await settle();
    partLoads[1].resolve([part('new')]);
    expect((await after).columns[0].mpn).toBe('MPN-new');
    partLoads[0].resolve([part('old')]);
    expect((await before).columns[0].mpn).toBe('MPN-old');

    const later = await service.matrix(PRODUCT, { partIds: [PART] }, rules as RuleDefinition[]);
    expect(later.columns[0]).toMatchObject({ mpn: 'MPN-new', reviewState: 'approved' });
  });

  it('facts computed from data before the write are not used by a request that read the new revision', async () => {
    const { service, state, partLoads, rules } = harness();
    const before = service.matrix(PRODUCT, { partIds: [PART] }, rules as RuleDefinition[]);
    await settle();
    state.revision = 2;
    const after = service.matrix(PRODUCT, { partIds: [PART] }, rules as RuleDefinition[]);
    await settle();
    // A finishes first and evaluates its old data; B evaluates afterwards.
    partLoads[0].resolve([part('old')]);
    const old = await before;
    partLoads[1].resolve([part('new')]);
    const fresh = await after;

    const reference = harness();
    reference.state.revision = 2;
    const expected = reference.service.matrix(PRODUCT, { partIds: [PART] }, reference.rules as RuleDefinition[]);
    await settle();
    reference.partLoads[0].resolve([part('new')]);
    const truth = await expected;
    expect(truth.cells[0].status).not.toBe(old.cells[0].status);
    expect(fresh.cells).toEqual(truth.cells);
  });

  it('candidates never take the approved catalogue from a load that began before the write', async () => {
    const { service, state, catalogueLoads } = harness();
    const before = service.candidates(PRODUCT, RADIO);
    await settle();
    state.revision = 2;
    const after = service.candidates(PRODUCT, RADIO);
    await settle();
    expect(catalogueLoads).toHaveLength(2);
    catalogueLoads[0].resolve([]);
    catalogueLoads[1].resolve([part('new')]);
    expect((await before).candidates).toEqual([]);
    expect((await after).candidates.map((c) => c.mpn)).toEqual(['MPN-new']);
    // And the old load, finishing last, left nothing behind for revision 2.
    const again = await service.candidates(PRODUCT, RADIO);
    expect(again.candidates.map((c) => c.mpn)).toEqual(['MPN-new']);
    expect(catalogueLoads).toHaveLength(2);
  });
});
