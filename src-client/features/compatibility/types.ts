import type { components } from '../../lib/api-types';

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
