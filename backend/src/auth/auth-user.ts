import type { Role } from '@causeway/shared';

/** What a verified token gives every handler. */
export interface AuthUser {
  id: string;
  email: string;
  role: Role;
  shopId: string | null;
  shopOwner: boolean;
}

export interface JwtPayload {
  sub: string;
  /** Token version: must equal the user's current one. */
  tv: number;
}
