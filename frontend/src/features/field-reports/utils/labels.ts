import type { CorrectionField, FieldReportKind } from '@causeway/shared';

export const KIND_HINTS: Record<FieldReportKind, string> = {
  'confirmed-fix': 'A fault you fixed: the code, the vehicle, the part that fixed it and what you tried first.',
  'new-cause': 'A part that sets this code and is not yet listed as a possible cause, with its costs.',
  correction: "A part cost or labour time that is off, or a code's title or description that needs fixing.",
};

export const CORRECTION_FIELD_LABELS: Record<CorrectionField, string> = {
  partCostMinor: 'Part cost',
  replaceHours: 'Labour hours to replace',
  title: 'Title of the code',
  description: 'Description of the code',
};
