/** The entity types the log records, in words. */
export const ENTITY_TYPE_LABELS: Record<string, string> = {
  'field-report': 'Field report',
  'possible-cause': 'Possible cause',
  'dtc-code': 'Fault code',
  part: 'Part',
  teardown: 'Teardown',
  outcome: 'Outcome',
};

/** Actions and action families (a prefix ending in a dot matches the whole family). */
export const ACTION_OPTIONS: { label: string; options: { value: string; label: string }[] }[] = [
  {
    label: 'Families',
    options: [
      { value: 'report.', label: 'Every field report decision' },
      { value: 'cause.', label: 'Every possible-cause edit' },
      { value: 'code.', label: 'Every fault-code edit' },
      { value: 'part.', label: 'Every part edit' },
      { value: 'teardown.', label: 'Every teardown edit' },
    ],
  },
  {
    label: 'Actions',
    options: [
      { value: 'report.approve', label: 'Report approved' },
      { value: 'report.reject', label: 'Report rejected' },
      { value: 'cause.create', label: 'Possible cause added' },
      { value: 'cause.update', label: 'Possible cause changed' },
      { value: 'cause.delete', label: 'Possible cause removed' },
      { value: 'code.create', label: 'Fault code added' },
      { value: 'code.update', label: 'Fault code changed' },
      { value: 'part.create', label: 'Part added' },
      { value: 'part.update', label: 'Part changed' },
      { value: 'teardown.create', label: 'Teardown added' },
      { value: 'teardown.update', label: 'Teardown changed' },
      { value: 'outcome.record', label: 'Outcome recorded' },
    ],
  },
];

export function actionLabel(action: string): string {
  for (const group of ACTION_OPTIONS) {
    const found = group.options.find((o) => o.value === action);
    if (found) return found.label;
  }
  return action;
}
