import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import { AuditEntry } from './audit-entry.entity';

export interface AuditRecord {
  entityType: string;
  entityId: string | number;
  action: string;
  userId: number | null;
  changes: Record<string, unknown>;
}

export interface AuditEntryView {
  id: string;
  entityType: string;
  entityId: string;
  action: string;
  /** Who did it: by name; the e-mail only in the admins' audit log. */
  user: { id: number; name: string; email?: string } | null;
  changes: Record<string, unknown>;
  at: string;
}

/** Field-by-field difference as { field: [before, after] } for the audit log. */
export function diffFields<T extends object>(before: T, after: Partial<T>, fields: (keyof T)[]): Record<string, [unknown, unknown]> {
  const changes: Record<string, [unknown, unknown]> = {};
  for (const field of fields) {
    if (!(field in after)) continue;
    const a = before[field];
    const b = after[field];
    if (JSON.stringify(a) !== JSON.stringify(b)) changes[String(field)] = [a ?? null, b ?? null];
  }
  return changes;
}

@Injectable()
export class AuditService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Write inside the caller's transaction so the change and its audit entry land together. */
  async record(manager: EntityManager, entry: AuditRecord): Promise<void> {
    await manager.insert(AuditEntry, { ...entry, entityId: String(entry.entityId), changes: entry.changes as object });
  }

  /** Entries newest first; `withEmails` only for the admins' audit log, since histories are shown to every role. */
  async list(
    filter: { entityType?: string; entityId?: string | number; limit?: number; offset?: number },
    { withEmails = false }: { withEmails?: boolean } = {},
  ): Promise<{ items: AuditEntryView[]; total: number }> {
    const query = this.dataSource
      .getRepository(AuditEntry)
      .createQueryBuilder('a')
      .leftJoinAndSelect('a.user', 'u')
      .orderBy('a.created_at', 'DESC')
      .addOrderBy('a.id', 'DESC')
      .take(Math.min(filter.limit ?? 100, 500))
      .skip(filter.offset ?? 0);
    if (filter.entityType) query.andWhere('a.entity_type = :type', { type: filter.entityType });
    if (filter.entityId !== undefined) query.andWhere('a.entity_id = :id', { id: String(filter.entityId) });
    const [rows, total] = await query.getManyAndCount();
    return {
      total,
      items: rows.map((row) => ({
        id: row.id,
        entityType: row.entityType,
        entityId: row.entityId,
        action: row.action,
        user: row.user ? { id: row.user.id, name: row.user.name, ...(withEmails ? { email: row.user.email } : {}) } : null,
        changes: row.changes,
        at: row.createdAt.toISOString(),
      })),
    };
  }
}
