import { FileTextOutlined, PrinterOutlined } from '@ant-design/icons';
import { Button, Card, Drawer, Result, Spin } from 'antd';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { EstimatesList } from '@/features/estimates/components/estimates-list';
import { PrepareEstimate } from '@/features/estimates/components/prepare-estimate';
import { useJob } from '@/features/jobs/api/get-job';
import { JobWorkspace } from '@/features/jobs/components/job-workspace';
import { useVehicle } from '@/features/vehicles/api/get-vehicle';
import { isApiError } from '@/lib/api-client';

export function Component() {
  const { id = '' } = useParams();
  const job = useJob(id);
  const vehicle = useVehicle(job.data?.vehicle.id);
  const [preparing, setPreparing] = useState(false);

  if (job.isPending) return <Spin size="large" description="Loading the job" style={{ display: 'block', margin: '64px auto' }} />;
  if (job.isError) {
    const notFound = isApiError(job.error) && job.error.status === 404;
    return (
      <Result
        status={notFound ? '404' : 'error'}
        title={notFound ? 'No such job in your shop' : 'The job could not be loaded'}
        subTitle={job.error.message}
        extra={<Link to={paths.jobs}>Back to the jobs</Link>}
      />
    );
  }
  const data = job.data;
  const open = data.status === 'open';
  return (
    <JobWorkspace
      job={data}
      vehicleHref={paths.vehicle}
      actions={
        <>
          {open && (
            <Button icon={<FileTextOutlined aria-hidden />} onClick={() => setPreparing(true)}>
              Prepare estimate
            </Button>
          )}
          <Button href={paths.jobEstimatePrint(data.id)} target="_blank" icon={<PrinterOutlined aria-hidden />}>
            Printable estimate
          </Button>
        </>
      }
    >
      <Card title={<h2 style={{ fontSize: 20, margin: 0 }}>Staged estimates</h2>} style={{ marginTop: 24 }}>
        <EstimatesList jobId={data.id} locale={data.locale} closed={!open} printHref={(estimateId) => paths.jobEstimatePrint(data.id, estimateId)} />
      </Card>
      <Drawer title="Prepare a staged estimate" open={preparing} onClose={() => setPreparing(false)} destroyOnHidden size="large" styles={{ wrapper: { maxWidth: '100vw', width: 960 } }}>
        <PrepareEstimate job={data} ownerEmail={vehicle.data?.ownerEmail ?? null} printHref={paths.jobEstimatePrint(data.id)} />
      </Drawer>
    </JobWorkspace>
  );
}
