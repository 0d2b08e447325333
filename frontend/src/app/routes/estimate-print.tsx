import { Alert, Spin } from 'antd';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { useEstimate } from '@/features/estimates/api/get-estimate';
import { PrintableEstimate } from '@/features/estimates/components/printable-estimate';
import { useJob } from '@/features/jobs/api/get-job';
import { useCurrentUser } from '@/lib/current-user';

function PrintPage() {
  const { id = '' } = useParams();
  const [search] = useSearchParams();
  const estimateId = search.get('estimate') ?? undefined;
  const { shop } = useCurrentUser();
  const job = useJob(id);
  const estimate = useEstimate(id, estimateId);
  const back = <Link to={paths.job(id)}>Back to the job</Link>;

  if (job.isPending || (estimateId && estimate.isPending)) {
    return <Spin size="large" description="Loading the estimate" style={{ display: 'block', margin: '64px auto' }} />;
  }
  const error = job.error ?? estimate.error;
  if (error) {
    return (
      <div style={{ maxWidth: 720, margin: '48px auto', padding: '0 16px' }}>
        <Alert type="error" showIcon title="The estimate could not be loaded" description={error.message} />
        <p>{back}</p>
      </div>
    );
  }
  if (!job.data) return null;
  return <PrintableEstimate shopName={shop?.name ?? ''} job={job.data} estimate={estimate.data} back={back} />;
}

/** The printable staged estimate: signed in, but with nothing around it but the page. */
export function Component() {
  return (
    <RequireAuth>
      <PrintPage />
    </RequireAuth>
  );
}
