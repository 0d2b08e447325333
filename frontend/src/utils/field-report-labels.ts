import type { FieldReportKind, FieldReportStatus } from '@causeway/shared';

/** A field report's kind and status in words, for the author's pages and the review desk alike. */
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

/** Tag colours: teal for the good outcome, red for a rejection, neutral otherwise (amber is for safety only). */
export const STATUS_COLOURS: Record<FieldReportStatus, string | undefined> = {
  draft: undefined,
  submitted: 'processing',
  approved: 'success',
  rejected: 'error',
  withdrawn: undefined,
};
