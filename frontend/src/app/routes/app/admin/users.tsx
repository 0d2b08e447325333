import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { section } from '@/config/sections';
import { UsersTable } from '@/features/users/components/users-table';
import { parseUserListParams, toUserListSearch } from '@/features/users/utils/list-params';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const user = useCurrentUser();
  const [searchParams, setSearchParams] = useSearchParams();
  const params = parseUserListParams(searchParams);
  const page = section('adminUsers');
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <UsersTable
        params={params}
        onParamsChange={(next) => setSearchParams(toUserListSearch(next))}
        currentUserId={user.id}
        locale={user.shop?.locale ?? browserLocale()}
      />
    </>
  );
}
