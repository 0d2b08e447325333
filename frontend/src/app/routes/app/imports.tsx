import { Result, Typography } from 'antd';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { section } from '@/config/sections';
import { ImportDetail } from '@/features/imports/components/import-detail';
import { ImportHistoryTable } from '@/features/imports/components/import-history-table';
import { ImportWizard } from '@/features/imports/components/import-wizard';
import { useCurrentUser } from '@/lib/current-user';

const importPath = (id: string) => `${paths.imports}/${encodeURIComponent(id)}`;

function pageParams(search: URLSearchParams) {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  return { page: Number.isSafeInteger(page) && page >= 1 ? page : 1, pageSize: [10, 25, 50].includes(pageSize) ? pageSize : 10 };
}

export function Component() {
  const { id } = useParams();
  const { shop } = useCurrentUser();
  const [searchParams, setSearchParams] = useSearchParams();
  const page = section('imports');
  if (!shop) return <Result status="info" title="Imports belong to a shop" subTitle="Ask the owner of your shop for an invite code." />;
  if (id) {
    return (
      <>
        <PageHeader title="Import report" description={<Link to={paths.imports}>Back to imports</Link>} />
        <ImportDetail id={id} locale={shop.locale} distanceUnit={shop.distanceUnit} />
      </>
    );
  }
  const params = pageParams(searchParams);
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <ImportWizard distanceUnit={shop.distanceUnit} locale={shop.locale} importPath={importPath} />
      <Typography.Title level={2} style={{ fontSize: 22, marginTop: 40 }}>
        Import history
      </Typography.Title>
      <ImportHistoryTable
        params={params}
        onParamsChange={(next) => {
          const search = new URLSearchParams();
          if (next.page !== 1) search.set('page', String(next.page));
          if (next.pageSize !== 10) search.set('pageSize', String(next.pageSize));
          setSearchParams(search);
        }}
        importPath={importPath}
        locale={shop.locale}
      />
    </>
  );
}
