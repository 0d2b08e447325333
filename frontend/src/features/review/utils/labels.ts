import type { FieldReportKind, FieldReportStatus } from '@causeway/shared';

export const KIND_LABELS: Record<FieldReportKind, string> = {
  'confirmed-fix': 'Confirmed fix',
  'new-cause': 'New possible cause',
  correction: 'Correction',
};

export const STATUS_LABELS: Record<FieldReportStatus, string> = {
  draft: 'Draft',
  submitted: 'Waiting for review',
  approved: 'Approved',
  rejected: 'Rejected',
  withdrawn: 'Withdrawn',
};

export const STATUS_COLOURS: Record<FieldReportStatus, string | undefined> = {
  draft: undefined,
  submitted: 'processing',
  approved: 'success',
  rejected: 'error',
  withdrawn: undefined,
};
