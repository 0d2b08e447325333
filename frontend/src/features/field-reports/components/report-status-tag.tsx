import type { FieldReportStatus } from '@causeway/shared';
import { Tag } from 'antd';
import { STATUS_COLOURS, STATUS_LABELS } from '@/utils/field-report-labels';

export function ReportStatusTag({ status }: { status: FieldReportStatus }) {
  return <Tag color={STATUS_COLOURS[status]}>{STATUS_LABELS[status]}</Tag>;
}
