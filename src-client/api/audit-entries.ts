import type { components } from '../lib/api-types';

/** One audit entry, as GET /audit, /parts/:id/history, /products/:id/history and the assignments history answer it. */
export type AuditEntry = components['schemas']['AuditEntryDto'];

/** One page of entries, newest first, and how many there are in all. */
export type AuditPage = components['schemas']['AuditPageDto'];
