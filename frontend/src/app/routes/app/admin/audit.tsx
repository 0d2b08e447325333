import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { AuditTable } from '@/features/audit/components/audit-table';
import { parseAuditListParams, toAuditListSearch } from '@/features/audit/utils/list-params';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const user = useCurrentUser();
  const [searchParams, setSearchParams] = useSearchParams();
  const page = section('adminAudit');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <AuditTable
        params={parseAuditListParams(searchParams)}
        onParamsChange={(next) => setSearchParams(toAuditListSearch(next))}
        locale={user.shop?.locale ?? browserLocale()}
      />
    </>
  );
}
