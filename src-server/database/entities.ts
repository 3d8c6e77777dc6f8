import { AuditEntry } from '../audit/audit-entry.entity';
import { User } from '../users/user.entity';
import { UserToken } from '../users/user-token.entity';

/** Every TypeORM entity; add new domains here. */
export const ENTITIES = [User, UserToken, AuditEntry];
