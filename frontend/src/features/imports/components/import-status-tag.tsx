import type { ImportStatus } from '@causeway/shared';
import { Tag } from 'antd';

export const IMPORT_STATUS_LABELS: Record<ImportStatus, string> = {
  running: 'Running',
  committed: 'Imported',
  refused: 'Refused (rows with errors)',
  failed: 'Failed',
  interrupted: 'Interrupted',
};

const COLOURS: Record<ImportStatus, string | undefined> = { running: 'processing', committed: 'success', refused: 'error', failed: 'error', interrupted: undefined };

export function ImportStatusTag({ status }: { status: ImportStatus }) {
  return <Tag color={COLOURS[status]}>{IMPORT_STATUS_LABELS[status]}</Tag>;
}
