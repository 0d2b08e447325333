import { roleAtLeast, type Role, type UserDto } from '@causeway/shared';

/** Who may use something: at least a role, and/or the owner of a shop (a flag beside the role). */
export interface Access {
  minRole?: Role;
  shopOwner?: boolean;
}

export function canAccess(user: UserDto | null | undefined, access: Access): boolean {
  if (!user || user.disabled) return false;
  if (access.minRole && !roleAtLeast(user.role, access.minRole)) return false;
  if (access.shopOwner && !user.shopOwner) return false;
  return true;
}
