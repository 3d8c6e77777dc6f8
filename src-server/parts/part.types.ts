import { EFFICIENCY_BASES, type EfficiencyBasis, GAIN_BASES, type GainBasis } from '../rf/figure-basis';

/** The closed vocabularies of a part (issue 5); shared by entities, DTOs, CSV import and the search index. */
export const FORM_FACTORS = ['chip', 'pcb-trace', 'flex', 'stamped-metal', 'patch', 'external-whip', 'panel'] as const;
export type FormFactor = (typeof FORM_FACTORS)[number];

export { CONNECTORS, type Connector } from '../common/connectors';

export const POLARIZATIONS = ['linear', 'RHCP', 'LHCP'] as const;
export type PartPolarization = (typeof POLARIZATIONS)[number];

export const LIFECYCLES = ['active', 'nrnd', 'eol'] as const;
export type Lifecycle = (typeof LIFECYCLES)[number];

export const REVIEW_STATES = ['draft', 'in-review', 'approved', 'restricted', 'retired'] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

export const MEASUREMENT_KINDS = ['s11', 'efficiency', 'peak-gain', 'average-gain'] as const;
export type MeasurementKind = (typeof MEASUREMENT_KINDS)[number];

export { EFFICIENCY_BASES, type EfficiencyBasis, GAIN_BASES, type GainBasis, FIGURE_STATISTICS, type FigureStatistic } from '../rf/figure-basis';

/** The basis a measurement states: efficiency radiation | total, gains peak | realized (s11 has none). */
export const MEASUREMENT_BASES = [...EFFICIENCY_BASES, ...GAIN_BASES] as const;
export type MeasurementBasis = EfficiencyBasis | GainBasis;

/** The bases a kind accepts; empty for s11. */
export const BASES_OF_KIND: Readonly<Record<MeasurementKind, readonly MeasurementBasis[]>> = {
  s11: [],
  efficiency: EFFICIENCY_BASES,
  'peak-gain': GAIN_BASES,
  'average-gain': GAIN_BASES,
};

export const DOCUMENT_KINDS = ['datasheet', 'drawing', 'other'] as const;
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

export const ALTERNATE_KINDS = ['alternate', 'second-source'] as const;
export type AlternateKind = (typeof ALTERNATE_KINDS)[number];
