import type { Role } from '@causeway/shared';

export const ROLE_LABELS: Record<Role, string> = {
  technician: 'Technician',
  contributor: 'Contributor',
  moderator: 'Moderator',
  admin: 'Admin',
};

/** What a shop owner may hand out with an invite; higher roles are an admin's decision. */
export const INVITABLE_ROLES = ['technician', 'contributor'] as const satisfies readonly Role[];

export type InvitableRole = (typeof INVITABLE_ROLES)[number];
