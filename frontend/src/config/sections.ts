import type { Access } from '@/lib/authorization';
import { paths } from './paths';

export type SectionKey =
  | 'home'
  | 'codes'
  | 'jobs'
  | 'vehicles'
  | 'imports'
  | 'reports'
  | 'review'
  | 'knowledge'
  | 'shop'
  | 'insights'
  | 'adminUsers'
  | 'adminAudit';

export type SectionGroup = 'work' | 'shop' | 'knowledge' | 'administration';

export interface Section {
  key: SectionKey;
  path: string;
  label: string;
  /** One sentence of what the page is for; shown on the page and in quick links. */
  purpose: string;
  group: SectionGroup;
  access: Access;
}

export const SECTION_GROUP_LABELS: Record<SectionGroup, string> = {
  work: 'Workshop',
  shop: 'Your shop',
  knowledge: 'Knowledge',
  administration: 'Administration',
};

/**
 * The sections of the signed-in app and who may see them. The side navigation, the quick
 * links and the route guards all read this list, so they cannot disagree.
 */
export const SECTIONS: readonly Section[] = [
  {
    key: 'home',
    path: paths.home,
    label: 'Home',
    purpose: 'Your starting point: look up a code and see your shop at a glance.',
    group: 'work',
    access: {},
  },
  {
    key: 'codes',
    path: paths.codes,
    label: 'Fault codes',
    purpose:
      'Look up a fault code: what it means, its possible causes on the vehicle in the bay, and the fix path that costs least on average.',
    group: 'work',
    access: {},
  },
  {
    key: 'jobs',
    path: paths.jobs,
    label: 'Jobs',
    purpose:
      'Open a job for a vehicle, record each check and replacement as you go, and close it with what actually fixed the fault.',
    group: 'work',
    access: {},
  },
  {
    key: 'vehicles',
    path: paths.vehicles,
    label: 'Vehicles',
    purpose: 'The vehicles your shop has worked on, found by VIN, with their jobs and the codes read from them.',
    group: 'work',
    access: {},
  },
  {
    key: 'imports',
    path: paths.imports,
    label: 'Imports',
    purpose:
      'Bring in the codes a scan tool saved as CSV: match its columns, preview every row with its problems, then commit the file in one go.',
    group: 'work',
    access: { minRole: 'technician' },
  },
  {
    key: 'shop',
    path: paths.shop,
    label: 'Shop settings',
    purpose: "Your shop's labour rate, tax, currency and units, the invite codes you hand out, and who works with you.",
    group: 'shop',
    access: { shopOwner: true },
  },
  {
    key: 'insights',
    path: paths.insights,
    label: 'Insights',
    purpose: "How your shop's jobs turned out: what fixed which codes, and what following the fix path saved.",
    group: 'shop',
    access: { shopOwner: true },
  },
  {
    key: 'reports',
    path: paths.reports,
    label: 'Field reports',
    purpose:
      'Send in what you found: a confirmed fix with evidence photos, a new possible cause, or a correction to a part cost or labour time.',
    group: 'knowledge',
    access: { minRole: 'contributor' },
  },
  {
    key: 'review',
    path: paths.review,
    label: 'Review desk',
    purpose: 'Go through field reports and approve or reject each one with a reason; every decision is audited.',
    group: 'knowledge',
    access: { minRole: 'moderator' },
  },
  {
    key: 'knowledge',
    path: paths.knowledge,
    label: 'Knowledge base',
    purpose: 'Edit fault codes, their possible causes, teardowns, checks and safety cautions directly.',
    group: 'knowledge',
    access: { minRole: 'moderator' },
  },
  {
    key: 'adminUsers',
    path: paths.adminUsers,
    label: 'Users',
    purpose: 'Find accounts, change their roles, and disable or enable them.',
    group: 'administration',
    access: { minRole: 'admin' },
  },
  {
    key: 'adminAudit',
    path: paths.adminAudit,
    label: 'Audit log',
    purpose: 'Every moderation and administration decision: who made it, when, and why.',
    group: 'administration',
    access: { minRole: 'admin' },
  },
];

export function section(key: SectionKey): Section {
  const found = SECTIONS.find((s) => s.key === key);
  if (!found) throw new Error(`Unknown section ${key}`);
  return found;
}
