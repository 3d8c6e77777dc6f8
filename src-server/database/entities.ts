import { AuditEntry } from '../audit/audit-entry.entity';
import { User } from '../users/user.entity';
import { UserToken } from '../users/user-token.entity';
import { PART_ENTITIES } from '../parts/part-entities';

/** Every TypeORM entity; add new domains here. */
export const ENTITIES = [User, UserToken, AuditEntry, ...PART_ENTITIES];
