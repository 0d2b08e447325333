import {
  fromKm,
  type ConfirmedFixPayload,
  type CorrectionPayload,
  type DistanceUnit,
  type FieldReportDto,
  type NewCausePayload,
} from '@causeway/shared';
import { Descriptions, Typography, type DescriptionsProps } from 'antd';
import type { ReactNode } from 'react';
import { KIND_LABELS } from '@/utils/field-report-labels';
import { formatMoney } from '@/utils/money';
import { SYSTEM_LABELS } from '@/utils/part-systems';
import { describeScope } from '@/utils/vehicle-scope';
import { useCodeCauses } from '../api/get-code-causes';
import { useParts } from '../api/get-parts';
import { CORRECTION_FIELD_LABELS } from '../utils/labels';
import { causeKey } from '../utils/report-form';

type ReportPayloadProps = {
  report: Pick<FieldReportDto, 'kind' | 'payload' | 'code' | 'proposesNewCode'>;
  distanceUnit: DistanceUnit;
  locale: string;
};

function none(): ReactNode {
  return <Typography.Text type="secondary">Not given</Typography.Text>;
}

/** What a report says, in words, for its author and for the moderator. */
export function ReportPayload({ report, distanceUnit, locale }: ReportPayloadProps) {
  const parts = useParts();
  const correctsCause = report.kind === 'correction' && (report.payload as CorrectionPayload).target === 'cause';
  const causes = useCodeCauses(correctsCause ? report.code : null);
  const name = (key: string | null | undefined) => (key ? (parts.data?.find((p) => p.key === key)?.name ?? key) : null);
  const number = (n: number) => new Intl.NumberFormat(locale, { maximumFractionDigits: 2 }).format(n);
  const items: DescriptionsProps['items'] = [
    { key: 'kind', label: 'Kind', children: KIND_LABELS[report.kind] },
    {
      key: 'code',
      label: 'Fault code',
      children: (
        <>
          <Typography.Text code>{report.code}</Typography.Text>
          {report.proposesNewCode && <Typography.Text type="secondary"> — not in the catalogue yet</Typography.Text>}
        </>
      ),
    },
  ];
  if (report.kind === 'confirmed-fix') {
    const p = report.payload as ConfirmedFixPayload;
    items.push(
      { key: 'vehicle', label: 'Vehicle', children: [p.make, p.model, p.engine, p.year].filter(Boolean).join(' ') },
      { key: 'part', label: 'Fixed by', children: name(p.part) },
      {
        key: 'odometer',
        label: 'Odometer',
        children: p.odometerKm === null || p.odometerKm === undefined ? none() : `${number(Math.round(fromKm(p.odometerKm, distanceUnit)))} ${distanceUnit}`,
      },
      { key: 'tried', label: 'Tried first', children: p.triedFirst?.length ? p.triedFirst.map(name).join(', ') : none() },
    );
    if (p.codeTitle) items.push({ key: 'codeTitle', label: 'Proposed title', children: p.codeTitle });
    items.push({ key: 'notes', label: 'Notes', span: 'filled', children: p.notes ? <span style={{ whiteSpace: 'pre-wrap' }}>{p.notes}</span> : none() });
  } else if (report.kind === 'new-cause') {
    const p = report.payload as NewCausePayload;
    items.push(
      { key: 'part', label: 'Part', children: p.partName ? `${p.partName} (new part: ${p.part}${p.system ? `, ${SYSTEM_LABELS[p.system]}` : ''})` : name(p.part) },
      { key: 'scope', label: 'For', children: describeScope(p) },
      { key: 'prior', label: 'Proposed prior', children: new Intl.NumberFormat(locale, { style: 'percent', maximumFractionDigits: 1 }).format(p.prior) },
      { key: 'cost', label: 'Part cost', children: formatMoney(p.partCostMinor, p.currency, locale) },
      { key: 'hours', label: 'Labour to replace', children: `${number(p.replaceHours)} h` },
      { key: 'teardown', label: 'Teardown', children: p.teardown ?? none() },
      {
        key: 'check',
        label: 'Check',
        children: p.check ? `${p.check.description} (${number(p.check.hours)} h${p.check.mustPrecede ? ', must be done before replacing' : ''})` : none(),
      },
    );
    if (p.codeTitle) items.push({ key: 'codeTitle', label: 'Proposed title', children: p.codeTitle });
    items.push({ key: 'notes', label: 'Notes', span: 'filled', children: p.notes ? <span style={{ whiteSpace: 'pre-wrap' }}>{p.notes}</span> : none() });
  } else {
    const p = report.payload as CorrectionPayload;
    const row = causes.data?.find((c) => causeKey(c) === causeKey(p));
    const money = (minor: number) => (row ? formatMoney(minor, row.currency, locale) : `${minor} (minor units of the cause's currency)`);
    items.push(
      { key: 'target', label: 'Corrects', children: p.target === 'cause' ? `${name(p.part)} as a possible cause, for ${describeScope(p)}` : `The code${p.make ? ` (${p.make})` : ''}` },
      { key: 'field', label: 'Field', children: CORRECTION_FIELD_LABELS[p.field] },
      {
        key: 'value',
        label: 'Proposed value',
        children: p.field === 'replaceHours' && typeof p.value === 'number' ? `${number(p.value)} h` : p.field === 'partCostMinor' && typeof p.value === 'number' ? money(p.value) : String(p.value),
      },
      { key: 'reason', label: 'Reason', span: 'filled', children: <span style={{ whiteSpace: 'pre-wrap' }}>{p.reason}</span> },
    );
  }
  return <Descriptions bordered column={{ xs: 1, md: 2 }} items={items} />;
}
