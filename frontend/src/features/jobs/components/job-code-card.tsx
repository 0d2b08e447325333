import { formatMoney, type CautionDto, type JobCodeDto, type JobDto } from '@causeway/shared';
import { Alert, Card, Descriptions, Flex, Tag, Tooltip, Typography } from 'antd';
import { palette } from '@/config/theme';
import { CODE_STATE_LABELS, CODE_STATUS_HELP, CODE_STATUS_LABELS } from '../utils/labels';
import { listNames } from '../utils/fix-path';
import { FixPathStones } from './fix-path-stones';

type JobCodeCardProps = {
  job: JobDto;
  code: JobCodeDto;
};

function partName(job: JobDto, code: JobCodeDto, key: string): string {
  for (const step of job.steps) {
    const part = step.parts.find((p) => p.key === key);
    if (part) return part.label;
  }
  return code.fixPath?.causes.find((c) => c.key === key)?.label ?? key;
}

/** One code of the job: what it means, how it was read, where the work on it stands and its current fix path. */
export function JobCodeCard({ job, code }: JobCodeCardProps) {
  const freeze = Object.entries(code.freezeFrame);
  const stateColour = code.state === 'cleared' || code.state === 'cause-found' ? palette.green : code.state === 'exhausted' ? palette.red : palette.teal600;
  return (
    <Card
      data-testid={`job-code-${code.code}`}
      title={
        <Flex wrap gap={8} align="center">
          <span style={{ fontFamily: 'ui-monospace, SFMono-Regular, Menlo, monospace', fontSize: 20 }}>{code.display}</span>
          <span style={{ fontWeight: 400, whiteSpace: 'normal' }}>{code.title ?? 'No title in the catalogue'}</span>
        </Flex>
      }
      extra={
        <Flex gap={4} wrap>
          <Tooltip title={CODE_STATUS_HELP[code.status]}>
            <Tag tabIndex={0}>{CODE_STATUS_LABELS[code.status]}</Tag>
          </Tooltip>
          {job.status === 'open' && <Tag color={stateColour}>{CODE_STATE_LABELS[code.state]}</Tag>}
        </Flex>
      }
      style={{ marginBottom: 24 }}
    >
      {freeze.length > 0 && (
        <Descriptions
          size="small"
          title={<span style={{ fontSize: 16 }}>Freeze frame</span>}
          column={{ xs: 2, sm: 3, lg: 4 }}
          items={freeze.map(([name, value]) => ({ key: name, label: name, children: String(value) }))}
          style={{ marginBottom: 16 }}
        />
      )}
      {code.excludedParts.length > 0 && (
        <Typography.Paragraph>
          Ruled out in this job: {listNames(code.excludedParts.map((k) => partName(job, code, k)))} — left out of the path, the rest renormalised.
        </Typography.Paragraph>
      )}
      {code.outcome && (
        <Alert
          type={code.outcome.shared ? 'info' : 'success'}
          showIcon
          style={{ marginBottom: 16 }}
          title={code.outcome.shared ? 'Fractional credit: the fix is shared between the parts replaced together' : 'Outcome recorded'}
          description={code.outcome.summary}
        />
      )}
      {job.status === 'open' && code.state === 'cleared' && code.clearedBy.length > 1 && (
        <Alert
          type="info"
          showIcon
          style={{ marginBottom: 16 }}
          title="Several parts replaced in one stage cleared the code"
          description={`Closed as resolved, the fix is credited to ${listNames(code.clearedBy.map((k) => partName(job, code, k)))} in shares by their current likelihoods (fractional counts), since one replacement cannot tell which of them it was.`}
        />
      )}
      {code.fixPathNote && (
        <Typography.Paragraph type={code.fixPath ? undefined : 'secondary'}>{code.fixPathNote}</Typography.Paragraph>
      )}
      {code.fixPath && <FixPathStones fixPath={code.fixPath} locale={job.locale} />}
      {code.expectedCostAtOpenMinor !== null && (
        <Typography.Paragraph type="secondary" style={{ marginTop: 8, marginBottom: 0 }}>
          Expected cost when the job was opened: {formatMoney(code.expectedCostAtOpenMinor, job.currency, job.locale)} before tax.
        </Typography.Paragraph>
      )}
    </Card>
  );
}

/** The cautions of every code of the job, each once. */
export function jobCautions(job: JobDto): CautionDto[] {
  const byKey = new Map<string, CautionDto>();
  for (const code of job.codes) for (const c of code.cautions) if (!byKey.has(c.key)) byKey.set(c.key, c);
  return [...byKey.values()];
}
