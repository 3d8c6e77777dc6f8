import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export const FORM_FACTORS = [
  'chip',
  'pcb-trace',
  'flex',
  'stamped-metal',
  'patch',
  'external-whip',
  'panel',
] as const satisfies readonly Schemas['FormFactor'][];
export const CONNECTORS = ['solder-pad', 'SMA', 'RP-SMA', 'MMCX', 'MCX', 'N', 'micro-coax'] as const satisfies readonly Schemas['Connector'][];
export const POLARIZATIONS = ['linear', 'RHCP', 'LHCP'] as const satisfies readonly Schemas['PartPolarization'][];
export const LIFECYCLES = ['active', 'nrnd', 'eol'] as const satisfies readonly Schemas['Lifecycle'][];
export const REVIEW_STATES = ['draft', 'in-review', 'approved', 'restricted', 'retired'] as const satisfies readonly Schemas['ReviewState'][];
export const MEASUREMENT_KINDS = ['s11', 'efficiency', 'peak-gain', 'average-gain'] as const satisfies readonly Schemas['MeasurementKind'][];

export type FormFactor = Schemas['FormFactor'];
export type Connector = Schemas['Connector'];
export type Polarization = Schemas['PartPolarization'];
export type Lifecycle = Schemas['Lifecycle'];
export type ReviewState = Schemas['ReviewState'];
export type MeasurementKind = Schemas['MeasurementKind'];
export type MeasurementBasis = Schemas['MeasurementBasis'];
export type EfficiencyBasis = Schemas['EfficiencyBasis'];
export type GainBasis = Schemas['GainBasis'];
export type FigureStatistic = Schemas['FigureStatistic'];

export interface Price {
  currency: string;
  unitPrice: string;
}

export type PartSummary = Schemas['PartSummaryDto'];

export interface PartList {
  items: PartSummary[];
  total: number;
}

export type SortKey = 'mpn' | 'manufacturer' | 'title' | 'formFactor' | 'connector' | 'polarization' | 'lifecycle' | 'reviewState' | 'updatedAt' | 'price';

export interface PartFilters {
  q?: string;
  formFactor?: FormFactor[];
  connector?: Connector[];
  polarization?: Polarization[];
  status?: ReviewState[];
  lifecycle?: Lifecycle[];
  priceMax?: number;
  currency?: string;
  /** "791-862,880-960" in MHz. */
  covers?: string;
  vswrMax?: number;
  minEfficiencyPct?: number;
  sort?: SortKey;
  order?: 'asc' | 'desc';
  limit?: number;
  offset?: number;
}

export interface UserRef {
  id: number;
  name: string;
}

export type SpecBand = Schemas['SpecBandDto'];

export type Measurement = Schemas['MeasurementDto'];

export type RangeFigures = Schemas['RangeFiguresDto'];

export interface PartDocument {
  id: number;
  kind: 'datasheet' | 'drawing' | 'other';
  title: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: UserRef | null;
  createdAt: string;
}

export interface Offer {
  id: number;
  supplier: string;
  sku: string | null;
  currency: string;
  priceBreaks: { quantity: number; unitPrice: string }[];
  moq: number | null;
  leadTimeDays: number | null;
  lastCheckedOn: string | null;
  version: number;
}

export interface Alternate {
  partId: number;
  manufacturer: string;
  mpn: string;
  reviewState: ReviewState;
  kind: 'alternate' | 'second-source';
  note: string | null;
}

export type PartDetail = Schemas['PartDetailDto'];

export interface MeasurementPoints {
  id: number;
  kind: MeasurementKind;
  frequenciesHz: number[];
  values: number[];
  vswr?: number[];
  returnLossDb?: number[];
}

export interface CurvePreview {
  kind: MeasurementKind;
  sourceFormat: string;
  pointCount: number;
  fromMhz: number;
  toMhz: number;
  referenceOhms: number | null;
  valueLabel: string;
  frequenciesMhz: number[];
  values: number[];
}

export interface ReviewQueueItem {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
  version: number;
  submittedBy: UserRef | null;
  submittedAt: string | null;
  measuredKinds: MeasurementKind[];
  documentCount: number;
}

export interface HistoryEntry {
  id: string;
  action: string;
  user: { id: number; name: string } | null;
  changes: Record<string, unknown>;
  at: string;
}

/** A band of the band library, as GET /api/bands returns it. */
export interface LibraryBand {
  id: number;
  technology: string;
  designation: string;
  name: string;
  ranges: { role: string; fromMhz: number; toMhz: number }[];
}
