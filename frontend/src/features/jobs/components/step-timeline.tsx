import { formatMoney, type JobDto, type JobStepDto } from '@causeway/shared';
import { Typography } from 'antd';
import { palette } from '@/config/theme';
import { formatDateTime } from '@/utils/format';
import { STEP_RESULT_LABELS } from '../utils/labels';
import { listNames } from '../utils/fix-path';

type StepTimelineProps = { job: JobDto };

function describe(step: JobStepDto): string {
  const names = listNames(step.parts.map((p) => p.label));
  return step.kind === 'check' ? `Checked ${names}: ${STEP_RESULT_LABELS[step.result]}` : `Replaced ${names}: ${STEP_RESULT_LABELS[step.result]}`;
}

function dotColour(step: JobStepDto): string {
  if (step.result === 'cleared' || step.result === 'at-fault') return palette.green;
  return palette.grey600;
}

/** Every step of the job in the order it was recorded, with what it cost and who recorded it. */
export function StepTimeline({ job }: StepTimelineProps) {
  const multiple = job.codes.length > 1;
  if (job.steps.length === 0) {
    return <Typography.Paragraph type="secondary">No step recorded yet.</Typography.Paragraph>;
  }
  const opened = (
    <li style={{ position: 'relative', padding: '0 0 16px 28px' }}>
      <span aria-hidden style={{ position: 'absolute', left: -7, top: 6, width: 12, height: 12, borderRadius: '50%', background: palette.teal500 }} />
      <Typography.Text type="secondary">{formatDateTime(job.openedAt, job.locale)}</Typography.Text>
      <div>Job opened{job.technician ? ` for ${job.technician.displayName}` : ''}.</div>
    </li>
  );
  return (
    <ol aria-label="Timeline of steps" style={{ listStyle: 'none', margin: 0, padding: 0, borderLeft: `2px solid ${palette.grey200}`, marginLeft: 9 }}>
      {opened}
      {job.steps.map((step) => (
        <li key={step.id} style={{ position: 'relative', padding: '0 0 18px 28px' }} data-testid="timeline-step">
          <span
            aria-hidden
            style={{ position: 'absolute', left: -8, top: 5, width: 14, height: 14, borderRadius: '50%', background: palette.white, border: `3px solid ${dotColour(step)}` }}
          />
          <Typography.Text type="secondary">
            {formatDateTime(step.at, job.locale)} · step {step.sequence}
            {step.recordedBy ? ` · ${step.recordedBy.displayName}` : ''}
          </Typography.Text>
          <div style={{ fontWeight: 600 }}>
            {multiple ? `${step.code}: ` : ''}
            {describe(step)}
          </div>
          <div>{formatMoney(step.actualCostMinor, job.currency, job.locale)} before tax</div>
          {step.notes && <Typography.Paragraph style={{ marginBottom: 0, color: palette.grey700 }}>{step.notes}</Typography.Paragraph>}
        </li>
      ))}
      {job.closedAt && (
        <li style={{ position: 'relative', padding: '0 0 0 28px' }}>
          <span aria-hidden style={{ position: 'absolute', left: -8, top: 5, width: 14, height: 14, borderRadius: '50%', background: job.resolution === 'resolved' ? palette.green : palette.grey600 }} />
          <Typography.Text type="secondary">{formatDateTime(job.closedAt, job.locale)}</Typography.Text>
          <div style={{ fontWeight: 600 }}>Closed as {job.resolution === 'resolved' ? 'resolved, after the verification passed' : 'unresolved'}</div>
          {job.closeNotes && <Typography.Paragraph style={{ marginBottom: 0 }}>{job.closeNotes}</Typography.Paragraph>}
        </li>
      )}
    </ol>
  );
}
