import type { InsightsParams } from '../api/get-insights';

const DATE = /^\d{4}-\d{2}-\d{2}$/;

export function parseInsightsParams(search: URLSearchParams): InsightsParams {
  const from = search.get('from');
  const to = search.get('to');
  return { from: from && DATE.test(from) ? from : undefined, to: to && DATE.test(to) ? to : undefined };
}

export function toInsightsSearch(params: InsightsParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  return search;
}
