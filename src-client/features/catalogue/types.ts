export const FORM_FACTORS = ['chip', 'pcb-trace', 'flex', 'stamped-metal', 'patch', 'external-whip', 'panel'] as const;
export const CONNECTORS = ['solder-pad', 'SMA', 'RP-SMA', 'MMCX', 'MCX', 'N', 'micro-coax'] as const;
export const POLARIZATIONS = ['linear', 'RHCP', 'LHCP'] as const;
export const LIFECYCLES = ['active', 'nrnd', 'eol'] as const;
export const REVIEW_STATES = ['draft', 'in-review', 'approved', 'restricted', 'retired'] as const;
export const MEASUREMENT_KINDS = ['s11', 'efficiency', 'peak-gain', 'average-gain'] as const;

export type FormFactor = (typeof FORM_FACTORS)[number];
export type Connector = (typeof CONNECTORS)[number];
export type Polarization = (typeof POLARIZATIONS)[number];
export type Lifecycle = (typeof LIFECYCLES)[number];
export type ReviewState = (typeof REVIEW_STATES)[number];
export type MeasurementKind = (typeof MEASUREMENT_KINDS)[number];

export interface Price {
  currency: string;
  unitPrice: string;
}

export interface PartSummary {
  id: number;
  manufacturer: string;
  mpn: string;
  title: string;
  formFactor: FormFactor;
  connector: Connector;
  polarization: Polarization;
  lifecycle: Lifecycle;
  reviewState: ReviewState;
  measuredKinds: MeasurementKind[];
  lowestPrices: Price[];
  updatedAt: string;
}

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

export interface SpecBand {
  id?: number;
  fromMhz: number;
  toMhz: number;
  maxVswr: number | null;
  minReturnLossDb: number | null;
  efficiencyPct: number | null;
  peakGainDbi: number | null;
  averageGainDbi: number | null;
}

export interface Measurement {
  id: number;
  kind: MeasurementKind;
  groundLengthMm: number | null;
  groundWidthMm: number | null;
  conditions: string | null;
  fileName: string;
  sizeBytes: number;
  sha256: string;
  sourceFormat: string;
  referenceOhms: number | null;
  pointCount: number;
  fromMhz: number;
  toMhz: number;
  current: boolean;
  uploadedBy: UserRef | null;
  createdAt: string;
}

export interface RangeFigures {
  fromMhz: number;
  toMhz: number;
  matchSource: 'measured' | 'spec' | 'no-data';
  coveredFractionVswr2: number | null;
  worstVswr: number | null;
  worstVswrAtMhz: number | null;
  minReturnLossDb: number | null;
  efficiencySource: 'measured' | 'spec' | 'no-data';
  minEfficiencyPct: number | null;
  averageEfficiencyPct: number | null;
  averageEfficiencyDb: number | null;
  peakGainDbi: number | null;
  averageGainDbi: number | null;
  notes: string[];
}

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

export interface PartDetail extends Omit<PartSummary, 'measuredKinds' | 'lowestPrices'> {
  mounting: string | null;
  nominalImpedanceOhms: number;
  lengthMm: number | null;
  widthMm: number | null;
  heightMm: number | null;
  evalGroundLengthMm: number | null;
  evalGroundWidthMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  reviewComment: string | null;
  notes: string | null;
  version: number;
  createdBy: UserRef | null;
  submittedBy: UserRef | null;
  submittedAt: string | null;
  reviewedBy: UserRef | null;
  reviewedAt: string | null;
  createdAt: string;
  specBands: SpecBand[];
  measurements: Measurement[];
  figures: RangeFigures[];
  documents: PartDocument[];
  offers: Offer[];
  alternates: Alternate[];
  permissions: { edit: boolean; uploadData: boolean; submit: boolean; review: boolean; editSourcing: boolean };
}

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
