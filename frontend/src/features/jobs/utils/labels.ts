import type { CodeStatus, JobCodeState, JobResolution, JobStatus, JobVehicleSummary, StepResult } from '@causeway/shared';

export const CODE_STATUS_LABELS: Record<CodeStatus, string> = {
  stored: 'Stored',
  pending: 'Pending',
  permanent: 'Permanent',
};

export const CODE_STATUS_HELP: Record<CodeStatus, string> = {
  stored: 'Confirmed by the control unit; it lit the warning lamp.',
  pending: 'Seen once; not yet confirmed on a second drive cycle.',
  permanent: 'Cannot be cleared with a scan tool; it goes only once the monitor passes.',
};

export const CODE_STATE_LABELS: Record<JobCodeState, string> = {
  open: 'Possible causes remain',
  'cause-found': 'Cause found',
  cleared: 'Cleared — verify, then close',
  exhausted: 'Every listed cause tried',
};

export const STEP_RESULT_LABELS: Record<StepResult, string> = {
  'at-fault': 'at fault',
  'not-at-fault': 'not at fault',
  cleared: 'code cleared',
  'came-back': 'code came back',
};

export function jobStatusLabel(status: JobStatus, resolution: JobResolution | null): string {
  if (status === 'open') return 'Open';
  return resolution === 'resolved' ? 'Closed — resolved' : 'Closed — unresolved';
}

export function vehicleLabel(vehicle: Pick<JobVehicleSummary, 'make' | 'model' | 'engine' | 'year'>): string {
  return [vehicle.year, vehicle.make, vehicle.model, vehicle.engine].filter((x) => x !== null && x !== '').join(' ');
}
