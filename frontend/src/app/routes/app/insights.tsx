import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { InsightsView } from '@/features/insights/components/insights-view';
import { parseInsightsParams, toInsightsSearch } from '@/features/insights/utils/params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

/** Shop insights; recharts comes with this lazily loaded page only. */
export function Component() {
  const { shop } = useCurrentUser();
  const [params, setParams] = useSearchParamsState(parseInsightsParams, toInsightsSearch);
  const page = section('insights');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <InsightsView
        params={params}
        onParamsChange={setParams}
        locale={shop?.locale ?? browserLocale()}
      />
    </>
  );
}
