import { PlusOutlined } from '@ant-design/icons';
import { Button, Drawer } from 'antd';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { section } from '@/config/sections';
import { JobFilters } from '@/features/jobs/components/job-filters';
import { JobsTable } from '@/features/jobs/components/jobs-table';
import { NewJobForm } from '@/features/jobs/components/new-job-form';
import { parseJobListParams, toJobListSearch } from '@/features/jobs/utils/list-params';
import { VehicleForm } from '@/features/vehicles/components/vehicle-form';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const user = useCurrentUser();
  const { shop } = user;
  const navigate = useNavigate();
  const [opening, setOpening] = useState(false);
  const [params, onParamsChange] = useSearchParamsState(parseJobListParams, toJobListSearch);
  const page = section('jobs');
  const locale = shop?.locale ?? browserLocale();
  return (
    <>
      <PageHeader
        title={page.label}
        description={page.purpose}
        extra={
          shop && (
            <Button type="primary" icon={<PlusOutlined aria-hidden />} onClick={() => setOpening(true)}>
              New job
            </Button>
          )
        }
      />
      <JobFilters params={params} onParamsChange={onParamsChange} currentUserId={user.id} shopOwner={user.shopOwner} />
      <JobsTable params={params} onParamsChange={onParamsChange} locale={locale} jobHref={paths.job} />
      <Drawer title="New job" open={opening} onClose={() => setOpening(false)} destroyOnHidden size="large">
        {shop && (
          <NewJobForm
            distanceUnit={shop.distanceUnit}
            locale={locale}
            onCancel={() => setOpening(false)}
            onCreated={(job) => {
              setOpening(false);
              navigate(paths.job(job.id));
            }}
            renderNewVehicle={(picked) => <VehicleForm distanceUnit={shop.distanceUnit} locale={locale} onSaved={(vehicle) => picked(vehicle.id)} />}
          />
        )}
      </Drawer>
    </>
  );
}
