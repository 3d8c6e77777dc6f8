import type { components, operations } from '../../lib/api-types';
import type { AsTyped } from '../../lib/form-input';

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
export type DocumentKind = Schemas['DocumentKind'];
export type AlternateKind = Schemas['AlternateKind'];

export const DOCUMENT_KINDS = ['datasheet', 'drawing', 'other'] as const satisfies readonly DocumentKind[];

export type Price = Schemas['PriceDto'];

export type PartSummary = Schemas['PartSummaryDto'];

export type PartList = Schemas['PartListDto'];

/** GET /parts's query as the server documents it (lists there are comma-separated strings). */
type PartSearchQuery = NonNullable<operations['PartsController_list']['parameters']['query']>;

export type SortKey = NonNullable<PartSearchQuery['sort']>;

/** The search's filters as the catalogue page holds them: lists as typed arrays, which the request joins with commas. */
export type PartFilters = Omit<PartSearchQuery, 'formFactor' | 'connector' | 'polarization' | 'status' | 'lifecycle'> & {
  formFactor?: FormFactor[];
  connector?: Connector[];
  polarization?: Polarization[];
  status?: ReviewState[];
  lifecycle?: Lifecycle[];
};

export type UserRef = Schemas['UserRefDto'];

export type SpecBand = Schemas['SpecBandDto'];

export type Measurement = Schemas['MeasurementDto'];

export type RangeFigures = Schemas['RangeFiguresDto'];

export type PartDocument = Schemas['DocumentDto'];

export type Offer = Schemas['OfferDto'];

export type OfferInput = Schemas['CreateOfferDto'];

export type Alternate = Schemas['AlternateDto'];

export type PartDetail = Schemas['PartDetailDto'];

export type PartInput = Schemas['CreatePartDto'];

export type PartUpdate = Schemas['UpdatePartDto'];

export type ReviewDecision = Schemas['ReviewActionDto'];

export type MeasurementPoints = Schemas['MeasurementPointsDto'];

export type CurvePreview = Schemas['CurvePreviewDto'];

export type MeasurementUploadResult = Schemas['UploadMeasurementResultDto'];

export type ReviewQueueItem = Schemas['ReviewQueueItemDto'];

/** A band of the band library, as GET /api/bands returns it. */
export type LibraryBand = Schemas['BandDto'];

export type PartConsistency = Schemas['PartConsistencyDto'];

export type BandCheck = Schemas['BandCheckDto'];

export type MissingItem = Schemas['MissingItem'];

/** Offer bodies as the form sends them: numbers possibly as typed, so the server names a bad field. */
export type OfferUpdate = AsTyped<Schemas['UpdateOfferDto']>;

export type OfferFormInput = AsTyped<Schemas['CreateOfferDto']>;

export type OfferRemoval = Schemas['OfferRemovalDto'];
