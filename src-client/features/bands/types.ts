import type { BandFilter } from '../../api/bands';
import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type Technology = Schemas['Technology'];
export type RangeRole = Schemas['RangeRole'];

export type Band = Schemas['BandDto'];

export type { BandFilter };

export type BandSet = Schemas['BandSetDto'];

export type BandSetInput = Schemas['CreateBandSetDto'];

export type BandSetUpdate = Schemas['UpdateBandSetDto'];

/** Of a part's detail, what the band strip draws. */
export type PartCoverage = Pick<Schemas['PartDetailDto'], 'id' | 'manufacturer' | 'mpn' | 'coveredRanges'>;

/** A part found by text, for the band strip's "compare a part" picker. */
export type PartMatch = Schemas['PartSummaryDto'];

export { TECHNOLOGY_LABELS } from '../../lib/technology-labels';
