import type { AuthResponse, ShopDto, UserDto } from '@causeway/shared';

/** Invented test data: nothing here describes a real shop or person. */
export function makeShop(overrides: Partial<ShopDto> = {}): ShopDto {
  return {
    id: '6d3f2a4e-1c2b-4f8a-9e51-0a7b3c9d1e01',
    name: 'Test Bay Motors',
    currency: 'GBP',
    locale: 'en-GB',
    labourRateMinor: 12_000,
    taxRateBp: 2_000,
    distanceUnit: 'mi',
    ...overrides,
  };
}

export function makeUser(overrides: Partial<UserDto> = {}): UserDto {
  return {
    id: '0b9c1d2e-3f40-4a5b-8c6d-7e8f90a1b2c3',
    email: 'tech@example.test',
    displayName: 'Robin Tester',
    role: 'technician',
    shopOwner: false,
    disabled: false,
    shop: makeShop(),
    createdAt: '2025-01-15T09:30:00.000Z',
    ...overrides,
  };
}

export function makeAuthResponse(user: UserDto = makeUser(), accessToken = 'token-from-server'): AuthResponse {
  return { accessToken, expiresIn: 3600, user };
}
