import { DeleteOutlined, PlusOutlined } from '@ant-design/icons';
import { App, Button, Card, Flex, Modal, Popconfirm, Result, Spin } from 'antd';
import { useState } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { JobsTable } from '@/features/jobs/components/jobs-table';
import { NewJobForm } from '@/features/jobs/components/new-job-form';
import { parseJobListParams, toJobListSearch } from '@/features/jobs/utils/list-params';
import { useDeleteVehicle } from '@/features/vehicles/api/delete-vehicle';
import { useVehicle } from '@/features/vehicles/api/get-vehicle';
import { VehicleForm } from '@/features/vehicles/components/vehicle-form';
import { VehicleSummary } from '@/features/vehicles/components/vehicle-summary';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { isApiError } from '@/lib/api-client';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const { id = '' } = useParams();
  const { shop } = useCurrentUser();
  const { message } = App.useApp();
  const navigate = useNavigate();
  const [jobListParams, setJobListParams] = useSearchParamsState(parseJobListParams, toJobListSearch);
  const [editing, setEditing] = useState(false);
  const [openingJob, setOpeningJob] = useState(false);
  const vehicle = useVehicle(id);
  const remove = useDeleteVehicle({
    mutationConfig: {
      onSuccess: () => {
        void message.success('Vehicle removed');
        navigate(paths.vehicles);
      },
      onError: (error) => void message.error(error.message),
    },
  });
  const locale = shop?.locale ?? browserLocale();
  // The vehicle is this page's, not a filter in the address.
  const jobParams = { ...jobListParams, vehicleId: id };

  if (vehicle.isPending) return <Spin size="large" description="Loading the vehicle" style={{ display: 'block', margin: '64px auto' }} />;
  if (vehicle.isError) {
    const notFound = isApiError(vehicle.error) && vehicle.error.status === 404;
    return (
      <Result
        status={notFound ? '404' : 'error'}
        title={notFound ? 'No such vehicle in your shop' : 'The vehicle could not be loaded'}
        subTitle={vehicle.error.message}
        extra={<Link to={paths.vehicles}>Back to the vehicles</Link>}
      />
    );
  }
  const v = vehicle.data;
  return (
    <>
      <PageHeader
        title={[v.year, v.make, v.model, v.engine].filter(Boolean).join(' ') + (v.plate ? ` · ${v.plate}` : '')}
        description={<Link to={paths.vehicles}>All vehicles</Link>}
        extra={
          <Flex gap={8} wrap>
            <Button type="primary" icon={<PlusOutlined aria-hidden />} onClick={() => setOpeningJob(true)}>
              Open a job
            </Button>
            <Popconfirm
              title="Remove this vehicle?"
              description="Only a vehicle without jobs can be removed."
              okText="Remove"
              cancelText="Keep"
              onConfirm={() => remove.mutate(v.id)}
            >
              <Button icon={<DeleteOutlined aria-hidden />} loading={remove.isPending}>
                Remove
              </Button>
            </Popconfirm>
          </Flex>
        }
      />
      <Flex vertical gap={24}>
        <Card
          title={<h2 style={{ fontSize: 20, margin: 0 }}>Vehicle</h2>}
          extra={
            !editing && (
              <Button onClick={() => setEditing(true)}>Edit</Button>
            )
          }
        >
          {editing && shop ? (
            <VehicleForm vehicle={v} distanceUnit={shop.distanceUnit} locale={locale} onSaved={() => setEditing(false)} onCancel={() => setEditing(false)} />
          ) : (
            <VehicleSummary vehicle={v} locale={locale} />
          )}
        </Card>
        <Card title={<h2 style={{ fontSize: 20, margin: 0 }}>Jobs on this vehicle</h2>}>
          <JobsTable
            params={jobParams}
            onParamsChange={(next) => setJobListParams({ ...next, vehicleId: undefined })}
            locale={locale}
            jobHref={paths.job}
            hideVehicle
          />
        </Card>
      </Flex>
      <Modal title="Open a job" open={openingJob} onCancel={() => setOpeningJob(false)} footer={null} destroyOnHidden width={760}>
        {shop && (
          <NewJobForm
            vehicleId={v.id}
            distanceUnit={shop.distanceUnit}
            locale={locale}
            onCancel={() => setOpeningJob(false)}
            onCreated={(job) => {
              setOpeningJob(false);
              navigate(paths.job(job.id));
            }}
          />
        )}
      </Modal>
    </>
  );
}
