export const KNOWLEDGE_TABS = ['causes', 'parts', 'teardowns'] as const;
export type KnowledgeTab = (typeof KNOWLEDGE_TABS)[number];

/** The open table and its filter, as kept in the address bar. */
export interface KnowledgeParams {
  tab: KnowledgeTab;
  /** Possible causes of this code only (normalised), or every code. */
  code: string;
  /** Text filter of the parts and teardowns tables. */
  q: string;
  page: number;
}

export function parseKnowledgeParams(search: URLSearchParams): KnowledgeParams {
  const tab = KNOWLEDGE_TABS.find((t) => t === search.get('tab')) ?? 'causes';
  const page = Number.parseInt(search.get('page') ?? '', 10);
  return {
    tab,
    code: (search.get('code') ?? '').trim().toUpperCase().slice(0, 16),
    q: (search.get('q') ?? '').trim().slice(0, 100),
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
  };
}

export function toKnowledgeSearch(params: KnowledgeParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.tab !== 'causes') search.set('tab', params.tab);
  if (params.code) search.set('code', params.code);
  if (params.q) search.set('q', params.q);
  if (params.page !== 1) search.set('page', String(params.page));
  return search;
}
