import { App } from 'antd';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { section } from '@/config/sections';
import { ReportPayload } from '@/features/field-reports/components/report-payload';
import { ReviewQueueTable } from '@/features/review/components/review-queue-table';
import { ReviewReport } from '@/features/review/components/review-report';
import { parseQueueParams, toQueueSearch } from '@/features/review/utils/queue-params';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

const reviewPath = (id: string) => `${paths.review}/${encodeURIComponent(id)}`;

function Queue() {
  const page = section('review');
  const user = useCurrentUser();
  const [params, setParams] = useSearchParamsState(parseQueueParams, toQueueSearch);
  return (
    <>
      <PageHeader title={page.label} description={page.purpose} />
      <ReviewQueueTable
        params={params}
        onParamsChange={setParams}
        reportPath={reviewPath}
        locale={user.shop?.locale ?? browserLocale()}
      />
    </>
  );
}

function ReviewOne({ id }: { id: string }) {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const { message } = App.useApp();
  const locale = user.shop?.locale ?? browserLocale();
  const distanceUnit = user.shop?.distanceUnit ?? 'km';
  return (
    <>
      <PageHeader title="Field report on the review desk" description={<Link to={paths.review}>Back to the queue</Link>} />
      <ReviewReport
        id={id}
        currentUserId={user.id}
        locale={locale}
        renderPayload={(report) => <ReportPayload report={report} distanceUnit={distanceUnit} locale={locale} />}
        onDecided={(_report, decision) => {
          void message.success(decision === 'approved' ? 'Report approved; the contributor is being e-mailed' : 'Report rejected; the contributor is being e-mailed the reason');
          navigate(paths.review);
        }}
      />
    </>
  );
}

export function Component() {
  const { id } = useParams();
  return id ? <ReviewOne id={id} /> : <Queue />;
}
