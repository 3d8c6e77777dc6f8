import type { DataSource } from 'typeorm';
import { evenlySpacedFrequencies } from '../rf/curves';
import { packFloat64 } from '../parts/measurements/point-codec';
import { efficiencyAt, s11Curve, type EfficiencyLobe, type Resonance } from '../parts/demo/resonator-model';
import { CONNECTORS, FORM_FACTORS, LIFECYCLES, POLARIZATIONS, type ReviewState } from '../parts/part.types';

/**
 * A large invented catalogue for benchmarks: parts with resonator-model curves (the demo model),
 * written with multi-row INSERTs in one transaction per table so 10,000 parts load in seconds.
 * The curve files are not put in object storage: the benchmark reads points, not originals.
 */
const S11_POINTS = 201;
const EFFICIENCY_POINTS = 41;
const BATCH = 250;

/** Small deterministic PRNG (mulberry32) so every run builds the same catalogue. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const FAMILIES: { name: string; sweep: [number, number]; bands: [number, number][] }[] = [
  {
    name: 'LTE',
    sweep: [600, 3000],
    bands: [
      [698, 960],
      [1710, 2690],
    ],
  },
  {
    name: 'LTE-EU',
    sweep: [600, 2800],
    bands: [
      [791, 960],
      [1710, 2200],
    ],
  },
  { name: 'GNSS', sweep: [1450, 1750], bands: [[1559, 1610]] },
  { name: 'ISM24', sweep: [2200, 2700], bands: [[2400, 2500]] },
  {
    name: 'WIFI-DB',
    sweep: [2000, 6200],
    bands: [
      [2400, 2500],
      [5150, 5850],
    ],
  },
  { name: 'SUBGHZ', sweep: [750, 1050], bands: [[860, 930]] },
];

export interface BenchPart {
  id: number;
  manufacturerId: number;
  mpn: string;
  title: string;
  formFactor: string;
  connector: string;
  polarization: string;
  lifecycle: string;
  reviewState: ReviewState;
  specBands: [number, number, number, number][];
  s11: { f: number[]; re: number[]; im: number[] } | null;
  efficiency: { f: number[]; v: number[] } | null;
  price: string;
}

export function generateBenchParts(count: number, firstId: number, manufacturerIds: number[], seed = 20251101): BenchPart[] {
  const rnd = random(seed);
  const pick = <T>(list: readonly T[]) => list[Math.floor(rnd() * list.length)];
  const parts: BenchPart[] = [];
  for (let k = 0; k < count; k++) {
    const family = pick(FAMILIES);
    // Each band drifts and widens or narrows a little, so coverage varies from part to part.
    const designs = family.bands.map(([from, to]) => {
      const shift = 1 + (rnd() - 0.5) * 0.08;
      const widen = 1 + (rnd() - 0.5) * 0.15;
      const centre = Math.sqrt(from * to) * shift;
      const half = Math.sqrt(to / from) ** widen;
      return { fromMhz: centre / half, toMhz: centre * half, edgeVswr: 1.6 + rnd() * 1.6, peakPct: 25 + rnd() * 55 };
    });
    const measured = rnd() < 0.7;
    const state = rnd();
    const reviewState: ReviewState = state < 0.8 ? 'approved' : state < 0.88 ? 'draft' : state < 0.94 ? 'in-review' : state < 0.97 ? 'restricted' : 'retired';
    let s11: BenchPart['s11'] = null;
    let efficiency: BenchPart['efficiency'] = null;
    if (measured) {
      const f = [...evenlySpacedFrequencies(family.sweep[0] * 1e6, family.sweep[1] * 1e6, S11_POINTS)];
      const resonances: Resonance[] = designs.map((d) => ({ fromMhz: d.fromMhz, toMhz: d.toMhz, edgeVswr: d.edgeVswr }));
      s11 = { f, ...s11Curve(resonances, f) };
      const fe = [...evenlySpacedFrequencies(family.sweep[0] * 1e6, family.sweep[1] * 1e6, EFFICIENCY_POINTS)];
      const lobes: EfficiencyLobe[] = designs.map((d) => ({ fromMhz: d.fromMhz, toMhz: d.toMhz, peakPct: d.peakPct }));
      efficiency = { f: fe, v: fe.map((x) => efficiencyAt(lobes, x)) };
    }
    const id = firstId + k;
    parts.push({
      id,
      manufacturerId: pick(manufacturerIds),
      mpn: `BG-${family.name}-${String(id).padStart(6, '0')}`,
      title: `Generated ${family.name} antenna ${id} (benchmark data, invented)`,
      formFactor: pick(FORM_FACTORS),
      connector: pick(CONNECTORS),
      polarization: family.name === 'GNSS' ? pick(POLARIZATIONS) : 'linear',
      lifecycle: rnd() < 0.9 ? 'active' : pick(LIFECYCLES),
      reviewState,
      specBands: designs.map((d) => [Math.round(d.fromMhz), Math.round(d.toMhz), Math.round((d.edgeVswr + 0.2) * 10) / 10, Math.round(d.peakPct * 0.9)]),
      s11,
      efficiency,
      price: (0.05 + rnd() * 8).toFixed(4),
    });
  }
  return parts;
}

async function insertRows(dataSource: DataSource, table: string, columns: string[], rows: unknown[][]): Promise<void> {
  const placeholders = `(${columns.map(() => '?').join(',')})`;
  for (let i = 0; i < rows.length; i += BATCH) {
    const batch = rows.slice(i, i + BATCH);
    await dataSource.query(`INSERT INTO ${table} (${columns.join(',')}) VALUES ${batch.map(() => placeholders).join(',')}`, batch.flat());
  }
}

/** Adds `count` generated parts (ids from 100001) unless they are already there; returns the time taken. */
export async function seedBenchCatalogue(dataSource: DataSource, count = 10_000): Promise<{ created: number; ms: number }> {
  const started = Date.now();
  const firstId = 100_001;
  const [{ n }] = await dataSource.query('SELECT COUNT(*) AS n FROM parts WHERE id >= ?', [firstId]);
  if (Number(n) >= count) return { created: 0, ms: Date.now() - started };
  await dataSource.query('DELETE FROM parts WHERE id >= ?', [firstId]);
  const makers = Array.from({ length: 40 }, (_, i) => `Benchgen Maker ${String(i + 1).padStart(2, '0')}`);
  await dataSource.query(`INSERT IGNORE INTO manufacturers (name) VALUES ${makers.map(() => '(?)').join(',')}`, makers);
  const makerRows: { id: number; name: string }[] = await dataSource.query('SELECT id, name FROM manufacturers WHERE name IN (?)', [makers]);
  const nameOf = new Map(makerRows.map((m) => [m.id, m.name]));
  const parts = generateBenchParts(
    count,
    firstId,
    makerRows.map((m) => m.id),
  );
  const [{ revision }] = await dataSource.query('SELECT revision + 1 AS revision FROM catalogue_revision WHERE id = 1');
  await insertRows(
    dataSource,
    'parts',
    [
      'id',
      'manufacturer_id',
      'mpn',
      'title',
      'form_factor',
      'connector',
      'polarization',
      'lifecycle',
      'review_state',
      'search_text',
      'eval_ground_length_mm',
      'eval_ground_width_mm',
      'revision',
    ],
    parts.map((p) => [
      p.id,
      p.manufacturerId,
      p.mpn,
      p.title,
      p.formFactor,
      p.connector,
      p.polarization,
      p.lifecycle,
      p.reviewState,
      `${nameOf.get(p.manufacturerId)} ${p.mpn} ${p.title}`,
      100,
      50,
      revision,
    ]),
  );
  await insertRows(
    dataSource,
    'part_spec_bands',
    ['part_id', 'from_mhz', 'to_mhz', 'max_vswr', 'efficiency_pct'],
    parts.flatMap((p) => p.specBands.map((b) => [p.id, ...b])),
  );
  await insertRows(
    dataSource,
    'part_offers',
    ['part_id', 'supplier', 'currency', 'price_breaks', 'min_unit_price', 'moq', 'lead_time_days'],
    parts.map((p) => [p.id, 'Northgate Parts Exchange', 'USD', JSON.stringify([{ quantity: 1, unitPrice: p.price }]), p.price, 1, 30]),
  );
  const measurementColumns = [
    'part_id',
    'kind',
    'basis',
    'file_name',
    'content_type',
    'object_key',
    'size_bytes',
    'sha256',
    'source_format',
    'reference_ohms',
    'point_count',
    'from_hz',
    'to_hz',
    'frequencies_hz',
    'values_a',
    'values_b',
  ];
  const none = '0'.repeat(64);
  await insertRows(
    dataSource,
    'part_measurements',
    measurementColumns,
    parts.flatMap((p) =>
      p.s11
        ? [
            [
              p.id,
              's11',
              null,
              `${p.mpn}.s1p`,
              'text/plain',
              `bench/${p.id}.s1p`,
              0,
              none,
              'generated',
              50,
              p.s11.f.length,
              p.s11.f[0],
              p.s11.f[p.s11.f.length - 1],
              packFloat64(p.s11.f),
              packFloat64(p.s11.re),
              packFloat64(p.s11.im),
            ],
          ]
        : [],
    ),
  );
  await insertRows(
    dataSource,
    'part_measurements',
    measurementColumns,
    parts.flatMap((p) =>
      p.efficiency
        ? [
            [
              p.id,
              'efficiency',
              'radiation',
              `${p.mpn}-efficiency.csv`,
              'text/csv',
              `bench/${p.id}.csv`,
              0,
              none,
              'generated',
              null,
              p.efficiency.f.length,
              p.efficiency.f[0],
              p.efficiency.f[p.efficiency.f.length - 1],
              packFloat64(p.efficiency.f),
              packFloat64(p.efficiency.v),
              null,
            ],
          ]
        : [],
    ),
  );
  // Tell every server's search index that the catalogue changed.
  await dataSource.query('UPDATE catalogue_revision SET revision = ? WHERE id = 1', [revision]);
  return { created: parts.length, ms: Date.now() - started };
}
