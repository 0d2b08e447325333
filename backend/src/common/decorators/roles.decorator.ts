import { SetMetadata } from '@nestjs/common';
import type { Role } from '@causeway/shared';

export const ROLES_KEY = 'roles';
/** The least role a route needs (roles are ranked: technician < contributor < moderator < admin). */
export const Roles = (minimum: Role) => SetMetadata(ROLES_KEY, minimum);

export const SHOP_OWNER_KEY = 'shopOwner';
/** The route is for the owner of the caller's shop (admins may too). */
export const ShopOwner = () => SetMetadata(SHOP_OWNER_KEY, true);
