import { PlusOutlined } from '@ant-design/icons';
import type { FieldError } from '@causeway/shared';
import { Alert, App, Button, Result, Skeleton } from 'antd';
import { Link, useLocation, useNavigate, useParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { shopDefaultsFor } from '@/config/locales';
import { paths } from '@/config/paths';
import { section } from '@/config/sections';
import { useReport } from '@/features/field-reports/api/get-report';
import { MyReportsTable } from '@/features/field-reports/components/my-reports-table';
import { ReportForm, type SavedHow } from '@/features/field-reports/components/report-form';
import { ReportView } from '@/features/field-reports/components/report-view';
import { KIND_LABELS } from '@/utils/field-report-labels';
import { parseMyReportsParams, toMyReportsSearch } from '@/features/field-reports/utils/list-params';
import { AttachmentGallery } from '@/features/review/components/attachment-gallery';
import { useSearchParamsState } from '@/hooks/use-search-params-state';
import { isApiError } from '@/lib/api-client';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

const reportPath = (id: string) => `${paths.reports}/${encodeURIComponent(id)}`;

interface ReportPageState {
  rejections?: FieldError[];
}

/** The shop's units and money, or sensible ones for an account without a shop. */
function useUnits() {
  const { shop } = useCurrentUser();
  const locale = shop?.locale ?? browserLocale();
  const fallback = shopDefaultsFor(locale);
  return { locale, currency: shop?.currency ?? fallback.currency, distanceUnit: shop?.distanceUnit ?? fallback.distanceUnit };
}

function useAfterSave() {
  const navigate = useNavigate();
  const { message } = App.useApp();
  return (id: string, how: SavedHow, rejections?: FieldError[]) => {
    if (how === 'submitted') {
      void message.success('Report submitted: it is now on the review desk');
      navigate(paths.reports);
    } else if (how === 'withdrawn') {
      void message.success('Report withdrawn');
      navigate(paths.reports);
    } else {
      void message.success('Draft saved');
      navigate(reportPath(id), { replace: true, state: { rejections } satisfies ReportPageState });
    }
  };
}

function MyReports() {
  const page = section('reports');
  const { locale } = useUnits();
  const [params, setParams] = useSearchParamsState(parseMyReportsParams, toMyReportsSearch);
  const navigate = useNavigate();
  return (
    <>
      <PageHeader
        title={page.label}
        description={page.purpose}
        extra={
          <Button type="primary" size="large" icon={<PlusOutlined aria-hidden />} onClick={() => navigate(reportPath('new'))}>
            New field report
          </Button>
        }
      />
      <MyReportsTable params={params} onParamsChange={setParams} reportPath={reportPath} locale={locale} />
    </>
  );
}

function NewReport() {
  const units = useUnits();
  const afterSave = useAfterSave();
  return (
    <>
      <PageHeader title="New field report" description="Tell the review desk what you found. Save a draft at any point; submit when it is complete." />
      <ReportForm {...units} onSaved={(report, how, rejections) => afterSave(report.id, how, rejections)} />
    </>
  );
}

function OneReport({ id }: { id: string }) {
  const units = useUnits();
  const afterSave = useAfterSave();
  const location = useLocation();
  const state = (location.state ?? {}) as ReportPageState;
  const report = useReport(id);
  if (report.isLoading) return <Skeleton active paragraph={{ rows: 8 }} />;
  if (report.isError) {
    if (isApiError(report.error) && report.error.status === 404) {
      return <Result status="404" title="Report not found" extra={<Link to={paths.reports}>Back to your field reports</Link>} />;
    }
    return <Alert type="error" showIcon title={report.error.message} />;
  }
  const data = report.data;
  if (!data) return null;
  const heading = data.status === 'draft' ? `Draft: ${KIND_LABELS[data.kind].toLowerCase()}` : data.title;
  return (
    <>
      <PageHeader title={heading} description={<Link to={paths.reports}>Back to your field reports</Link>} />
      {data.status === 'draft' ? (
        <ReportForm key={data.id} report={data} {...units} initialRejections={state.rejections} onSaved={(saved, how) => afterSave(saved.id, how)} />
      ) : (
        <ReportView report={data} distanceUnit={units.distanceUnit} locale={units.locale} attachments={<AttachmentGallery attachments={data.attachments} />} />
      )}
    </>
  );
}

export function Component() {
  const { id } = useParams();
  if (id === 'new') return <NewReport />;
  if (id) return <OneReport id={id} />;
  return <MyReports />;
}
