import { CreateUsersAndAudit1764620000000 } from './1764620000000-create-users-and-audit';
import { CreateBands1764700000000 } from './1764700000000-create-bands';
import { CreateProducts1764700100000 } from './1764700100000-create-products';
import { CreateCatalogue1764800000000 } from './1764800000000-create-catalogue';
import { CreateCompatibility1764900000000 } from './1764900000000-create-compatibility';
import { CreateMailOutbox1765000000000 } from './1765000000000-create-mail-outbox';
import { CreatePendingUploads1765100000000 } from './1765100000000-create-pending-uploads';
import { HardenAccounts1765300000000 } from './1765300000000-harden-accounts';
import { OwnershipAndLocking1765310000000 } from './1765310000000-ownership-and-locking';
import { OneApiVocabulary1765400000000 } from './1765400000000-one-api-vocabulary';
import { OnePolarizationVocabulary1765500000000 } from './1765500000000-one-polarization-vocabulary';
import { FigureBasis1765510000000 } from './1765510000000-figure-basis';
import { LimitsByServiceAndMarkets1765520000000 } from './1765520000000-limits-by-service-and-markets';
import { SimultaneousTransmit1765550000000 } from './1765550000000-simultaneous-transmit';
import { InProductMeasurements1765540000000 } from './1765540000000-in-product-measurements';
import { OfferStockAndUndo1765570000000 } from './1765570000000-offer-stock-and-undo';

/** Every migration in order; never edit one that has landed, add a new one. */
export const MIGRATIONS = [
  CreateUsersAndAudit1764620000000,
  CreateBands1764700000000,
  CreateProducts1764700100000,
  CreateCatalogue1764800000000,
  CreateCompatibility1764900000000,
  CreateMailOutbox1765000000000,
  CreatePendingUploads1765100000000,
  HardenAccounts1765300000000,
  OwnershipAndLocking1765310000000,
  OneApiVocabulary1765400000000,
  OnePolarizationVocabulary1765500000000,
  FigureBasis1765510000000,
  LimitsByServiceAndMarkets1765520000000,
  InProductMeasurements1765540000000,
  SimultaneousTransmit1765550000000,
  OfferStockAndUndo1765570000000,
];
