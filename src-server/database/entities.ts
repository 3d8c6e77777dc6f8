import { AuditEntry } from '../audit/audit-entry.entity';
import { User } from '../users/user.entity';
import { UserToken } from '../users/user-token.entity';
import { OutboxMail } from '../mail/outbox-mail.entity';
import { LoginAttempt } from '../auth/login-attempt.entity';
import { RateLimitCounter } from '../common/rate-limit-counter.entity';
import { PendingUpload } from '../storage/pending-upload.entity';
import { PART_ENTITIES } from '../parts/part-entities';
import { Band, BandRange } from '../bands/band.entity';
import { BandSet, BandSetMember } from '../bands/band-set.entity';
import { RegulatoryLimit } from '../regulatory/regulatory-limit.entity';
import { Product } from '../products/product.entity';
import { Radio, RadioBand } from '../products/radio.entity';
import { IN_PRODUCT_ENTITIES } from '../products/in-product/in-product-measurement.entity';
import { COMPATIBILITY_ENTITIES } from '../compatibility/compatibility.entities';

/** Every TypeORM entity; add new domains here. */
export const ENTITIES = [
  User,
  UserToken,
  AuditEntry,
  OutboxMail,
  LoginAttempt,
  RateLimitCounter,
  PendingUpload,
  ...PART_ENTITIES,
  Band,
  BandRange,
  BandSet,
  BandSetMember,
  RegulatoryLimit,
  Product,
  Radio,
  RadioBand,
  ...IN_PRODUCT_ENTITIES,
  ...COMPATIBILITY_ENTITIES,
];
