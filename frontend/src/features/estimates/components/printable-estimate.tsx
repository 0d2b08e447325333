import { PrinterOutlined } from '@ant-design/icons';
import type { EstimateDto, JobDto } from '@causeway/shared';
import { Button } from 'antd';
import { useMemo, type ReactNode } from 'react';
import { useDocumentTitle } from '@/hooks/use-document-title';
import { buildStages } from '@causeway/shared';
import { formatDay } from '../utils/format';
import { EstimateStages } from './estimate-stages';
import { estimablePaths } from './prepare-estimate';
import { latestDecisions } from './estimates-list';
import './printable-estimate.css';

type PrintableEstimateProps = {
  shopName: string;
  job: JobDto;
  /** A saved estimate; without one, the estimate the job's current fix paths give. */
  estimate?: EstimateDto;
  /** A way back to the job, shown on screen only. */
  back?: ReactNode;
};

function vehicleText(job: JobDto): string {
  const v = job.vehicle;
  return [v.year, v.make, v.model, v.engine].filter((x) => x !== null && x !== '').join(' ');
}

/** The staged estimate on one printable page: black on white, with no navigation. */
export function PrintableEstimate({ shopName, job, estimate, back }: PrintableEstimateProps) {
  useDocumentTitle(`Staged estimate · ${vehicleText(job)}`);
  const preview = useMemo(() => (estimate ? null : buildStages(estimablePaths(job), job.taxRateBp)), [estimate, job]);
  const stages = estimate?.stages ?? preview?.stages ?? [];
  const totals = estimate?.totals ?? preview?.totals;
  const currency = estimate?.currency ?? job.currency;
  const locale = estimate?.locale ?? job.locale;
  const taxRateBp = estimate?.taxRateBp ?? job.taxRateBp;

  return (
    <>
      <div className="printable-estimate-toolbar no-print">
        {back}
        <Button type="primary" icon={<PrinterOutlined aria-hidden />} onClick={() => window.print()}>
          Print
        </Button>
      </div>
      <main className="printable-estimate">
        <p style={{ margin: 0, fontWeight: 600 }}>{shopName}</p>
        <h1>Staged estimate</h1>
        <dl className="printable-estimate-meta">
          <dt>Vehicle</dt>
          <dd>
            {vehicleText(job)}
            {job.vehicle.plate ? ` · ${job.vehicle.plate}` : ''} · VIN {job.vehicle.vin}
          </dd>
          <dt>Complaint</dt>
          <dd>{job.complaint}</dd>
          <dt>Fault codes</dt>
          <dd>{job.codes.map((c) => `${c.display}${c.title ? ` (${c.title})` : ''}`).join('; ')}</dd>
          <dt>Date</dt>
          <dd>{formatDay(estimate?.createdAt ?? new Date().toISOString(), locale)}</dd>
          {estimate && (
            <>
              <dt>Valid until</dt>
              <dd>{formatDay(estimate.expiresAt, locale)}</dd>
            </>
          )}
        </dl>
        <h2>The stages</h2>
        <p style={{ marginTop: 0 }}>
          The work is done in stages, cheapest on average first. Each stage goes ahead only if the ones before it did not fix the fault, and only with your approval.
        </p>
        {totals && stages.length > 0 ? (
          <EstimateStages
            stages={stages}
            totals={totals}
            currency={currency}
            locale={locale}
            taxRateBp={taxRateBp}
            decisions={estimate ? latestDecisions(estimate) : undefined}
            plain
          />
        ) : (
          <p>No code of this job has a fix path with stages left to estimate.</p>
        )}
        <p style={{ fontSize: 14 }}>
          {estimate
            ? `${estimate.rounding} ${estimate.note}`
            : 'Tax is worked out per stage: the net price × the tax rate, rounded half away from zero to a whole minor unit; with tax = net + tax. The chances come from recorded repairs of this fault and are estimates, not promises.'}
        </p>
      </main>
    </>
  );
}
