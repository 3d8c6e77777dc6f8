/**
 * The audit log's entries, as GET /audit, /parts/:id/history and /products/:id/history answer them.
 * Written by hand because the server's OpenAPI document gives these three routes no response schema
 * (src-server/audit/audit.service.ts AuditEntryView); make it an alias of api-types.ts once it does.
 */
export interface AuditEntry {
  id: string;
  entityType: string;
  entityId: string;
  action: string;
  /** Who did it: by name; the e-mail only in the admins' audit log. */
  user: { id: number; name: string; email?: string } | null;
  /** Changed fields as { field: [before, after] }, or what was created or removed. */
  changes: Record<string, unknown>;
  at: string;
}

/** One page of entries, newest first, and how many there are in all. */
export interface AuditPage {
  items: AuditEntry[];
  total: number;
}
