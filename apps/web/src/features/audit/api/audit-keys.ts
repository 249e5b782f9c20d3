import type { AuditQuery } from './get-audit-entries.js';

export const auditKeys = {
  all: ['audit'] as const,
  page: (query: AuditQuery) => ['audit', 'page', query] as const,
};
