import type { components, operations } from '../../lib/api-types';

type Schemas = components['schemas'];
export type CellStatus = Schemas['CellStatus'];

export type Finding = Schemas['FindingDto'];

export type MatrixRow = Schemas['MatrixRowDto'];

export type MatrixColumn = Schemas['MatrixColumnDto'];

export type MatrixCell = Schemas['MatrixCellDto'];

export type Matrix = Schemas['MatrixDto'];

export type DecidingFigure = Schemas['DecidingFigureDto'];

export type CandidateBand = Schemas['CandidateBandDto'];

export type Candidate = Schemas['CandidateDto'];

export type Candidates = Schemas['CandidatesDto'];

export type Assignment = Schemas['AssignmentDto'];

/** A part for one radio of one product (shortlist, choice); the path names product and radio, the body the part. */
export type AssignmentTarget = { productId: number; radioId: number } & Schemas['ChoosePartDto'];

/** Of a part's detail, what the curve in the cell panel needs. */
export type PartMeasurements = Pick<Schemas['PartDetailDto'], 'id' | 'measurements'>;

export type MeasurementPoints = Schemas['MeasurementPointsDto'];

export type ProductEvaluation = Schemas['ProductEvaluationDto'];

export type EvaluationRadio = Schemas['EvaluationRadioDto'];

export type BillOfMaterials = Schemas['BillOfMaterialsDto'];

/** The candidates route's filters as the server reads them (lists comma-separated). */
export type CandidateQuery = NonNullable<operations['CompatibilityController_candidates']['parameters']['query']>;

/** The filters the candidates dialog offers, as the form holds them. */
export interface CandidateFilters {
  formFactor: FormFactor[];
  feed: Connector[];
  /** Decimal amount as typed, in `currency`; empty for no limit. */
  maxPrice: string;
  /** Whole days as typed; empty for no limit. */
  maxLeadTimeDays: string;
  quantity: number;
  currency: string;
}

export type FormFactor = Schemas['FormFactor'];

export type Connector = Schemas['Connector'];
