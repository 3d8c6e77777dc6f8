import { PartAlternate } from './sourcing/alternate.entity';
import { CatalogueRevision } from './catalogue-revision.entity';
import { PartDocument } from './documents/document.entity';
import { Manufacturer } from './manufacturer.entity';
import { Measurement } from './measurements/measurement.entity';
import { PartOffer, PartOfferRemoval } from './sourcing/offer.entity';
import { Part } from './part.entity';
import { SpecBand } from './spec-band.entity';

/** The catalogue's entities, registered once in database/entities.ts. */
export const PART_ENTITIES = [Manufacturer, Part, SpecBand, Measurement, PartDocument, PartOffer, PartOfferRemoval, PartAlternate, CatalogueRevision];
