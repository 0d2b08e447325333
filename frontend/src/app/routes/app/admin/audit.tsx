import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { AuditTable } from '@/features/audit/components/audit-table';
import { parseAuditListParams, toAuditListSearch } from '@/features/audit/utils/list-params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const user = useCurrentUser();
  const [params, setParams] = useSearchParamsState(parseAuditListParams, toAuditListSearch);
  const page = section('adminAudit');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <AuditTable
        params={params}
        onParamsChange={setParams}
        locale={user.shop?.locale ?? browserLocale()}
      />
    </>
  );
}
