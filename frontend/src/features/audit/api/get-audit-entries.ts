import type { AuditEntryDto, Page } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { AuditListParams } from '../utils/list-params';

export const AUDIT_QUERY_KEY = ['admin', 'audit'] as const;

/** `GET /api/admin/audit` (admins): newest first, filtered by actor, action, entity type and dates. */
export function getAuditEntries(params: AuditListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<AuditEntryDto>> {
  return api.get<Page<AuditEntryDto>>('/admin/audit', {
    signal,
    params: {
      page: params.page,
      pageSize: params.pageSize,
      actor: params.actor,
      action: params.action,
      entityType: params.entityType,
      from: params.from,
      to: params.to,
    },
  });
}

export function getAuditEntriesQueryOptions(params: AuditListParams) {
  return queryOptions({
    queryKey: [...AUDIT_QUERY_KEY, params] as const,
    queryFn: ({ signal }) => getAuditEntries(params, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useAuditEntries(params: AuditListParams) {
  return useQuery(getAuditEntriesQueryOptions(params));
}
