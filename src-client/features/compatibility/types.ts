import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type CellStatus = Schemas['CellStatus'];

export type Finding = Schemas['FindingDto'];

export type MatrixRow = Schemas['MatrixRowDto'];

export type MatrixColumn = Schemas['MatrixColumnDto'];

export type MatrixCell = Schemas['MatrixCellDto'];

export type Matrix = Schemas['MatrixDto'];

export interface DecidingFigure {
  ruleId: string;
  ruleTitle: string;
  designation: string;
  fact: string;
  value: number;
  threshold: number;
  marginDb: number;
  text: string;
}

export interface Candidate {
  partId: number;
  mpn: string;
  title: string;
  manufacturer: string;
  status: CellStatus;
  marginDb: number | null;
  deciding: DecidingFigure | null;
  assignment: 'shortlisted' | 'chosen' | null;
  bands: { bandId: number; designation: string; status: CellStatus; findings: Finding[] }[];
}

export interface Candidates {
  productId: number;
  radioId: number;
  radioName: string;
  evaluated: number;
  candidates: Candidate[];
}

export interface Assignment {
  id: number;
  productId: number;
  radioId: number;
  partId: number;
  mpn: string;
  title: string;
  state: 'shortlisted' | 'chosen';
  note: string | null;
  updatedAt: string;
}

/** Of a part's detail, what the curve in the cell panel needs. */
export interface PartMeasurements {
  id: number;
  measurements: { id: number; kind: 's11' | 'efficiency' | 'peak-gain' | 'average-gain'; current: boolean }[];
}

export interface MeasurementPoints {
  id: number;
  kind: string;
  frequenciesHz: number[];
  values: number[];
  vswr?: number[];
}
