/** Roles, in rising order of what they may do; each role may do everything the ones before it may. */
export const ROLES = ['technician', 'contributor', 'moderator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export function roleRank(role: Role): number {
  return ROLES.indexOf(role);
}

/** True when `role` may use something that needs at least `required`. */
export function roleAtLeast(role: Role, required: Role): boolean {
  return roleRank(role) >= roleRank(required);
}

export type DistanceUnit = 'km' | 'mi';

export interface ShopDto {
  id: string;
  name: string;
  /** ISO 4217 code, e.g. GBP. */
  currency: string;
  /** BCP 47 locale used to format numbers, e.g. en-GB. */
  locale: string;
  /** Labour rate per hour before tax, in integer minor units of `currency`. */
  labourRateMinor: number;
  /** Sales tax in basis points: 2000 = 20 %. */
  taxRateBp: number;
  distanceUnit: DistanceUnit;
}

export interface UserDto {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  shopOwner: boolean;
  disabled: boolean;
  shop: ShopDto | null;
  createdAt: string;
}

export interface AuthResponse {
  accessToken: string;
  /** Seconds until the token expires. */
  expiresIn: number;
  user: UserDto;
}

export interface RegisterRequest {
  email: string;
  password: string;
  displayName: string;
  /** Join an existing shop with the invite code its owner made … */
  inviteCode?: string;
  /** … or create a new shop of which the new user is the owner. */
  shop?: Omit<ShopDto, 'id'>;
}

export interface LoginRequest {
  email: string;
  password: string;
}

export interface InviteDto {
  code: string;
  role: Role;
  expiresAt: string;
  usedAt: string | null;
}

/** The rule every password must meet; the server states it in its 400 answer. */
export const PASSWORD_RULE = 'at least 10 characters, with at least one letter and one digit';
export function passwordMeetsRule(password: string): boolean {
  return password.length >= 10 && password.length <= 128 && /[A-Za-z]/.test(password) && /\d/.test(password);
}

/** One error body shape for every 4xx, so a form can put each message on its field. */
export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  errors?: FieldError[];
  /** Extra, endpoint-specific detail (e.g. the decoded structure of an unknown code). */
  details?: unknown;
}
export interface FieldError {
  /** Dotted path of the field, e.g. `shop.currency` or `causes.2.probability`. */
  field: string;
  message: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
