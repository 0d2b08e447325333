import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { UsersTable } from '@/features/users/components/users-table';
import { parseUserListParams, toUserListSearch } from '@/features/users/utils/list-params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const user = useCurrentUser();
  const [params, setParams] = useSearchParamsState(parseUserListParams, toUserListSearch);
  const page = section('adminUsers');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <UsersTable
        params={params}
        onParamsChange={setParams}
        currentUserId={user.id}
        locale={user.shop?.locale ?? browserLocale()}
      />
    </>
  );
}
