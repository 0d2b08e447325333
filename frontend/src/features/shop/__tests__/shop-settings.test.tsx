import type { InviteDto, ShopDto } from '@causeway/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, ok } from '@/testing/mock-api';
import { makeShop, makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const owner = makeUser({ displayName: 'Olu Owner', shopOwner: true, shop: makeShop({ labourRateMinor: 12_000, taxRateBp: 2_000 }) });

describe('Shop settings', () => {
  it('saves the labour rate and tax as integers and lists invites and members', async () => {
    const invites: InviteDto[] = [];
    const app = await renderApp('/shop', {
      user: owner,
      api: {
        'GET /api/shops/mine/members': ok([owner, makeUser({ id: 'm2', displayName: 'Mo Member', email: 'mo@example.test' })]),
        'GET /api/shops/mine/invites': () => jsonResponse(200, invites),
        'POST /api/shops/mine/invites': (request) => {
          const invite: InviteDto = { code: 'TBM-4K9P-22', role: (request.body as InviteDto).role, expiresAt: '2099-01-01T12:00:00.000Z', usedAt: null };
          invites.push(invite);
          return jsonResponse(201, invite);
        },
        'PATCH /api/shops/mine': (request) => jsonResponse(200, { ...owner.shop, ...(request.body as Partial<ShopDto>) }),
      },
    });

    const rate = await screen.findByLabelText(/Labour rate per hour/);
    expect(rate).toHaveValue('120.00');
    expect(screen.getByText('£120.00 per hour before tax is £144.00 with 20% tax.')).toBeInTheDocument();
    expect(await screen.findByText('Mo Member')).toBeInTheDocument();

    await app.user.clear(rate);
    await app.user.type(rate, '99.99');
    await app.user.clear(screen.getByLabelText(/Tax rate/));
    await app.user.type(screen.getByLabelText(/Tax rate/), '17.5');
    await app.user.click(screen.getByRole('button', { name: 'Save shop settings' }));

    expect(await screen.findByText('Shop settings saved')).toBeInTheDocument();
    expect(app.server.calls('PATCH /api/shops/mine')[0].body).toEqual({
      name: 'Test Bay Motors',
      currency: 'GBP',
      locale: 'en-GB',
      labourRateMinor: 9_999,
      taxRateBp: 1_750,
      distanceUnit: 'mi',
    });

    await app.user.click(screen.getByRole('button', { name: 'Create invite code' }));
    expect(app.server.calls('POST /api/shops/mine/invites')[0].body).toEqual({ role: 'technician' });
    const invitesSection = screen.getByRole('region', { name: 'Invite codes' });
    await waitFor(() => expect(within(invitesSection).getAllByText('TBM-4K9P-22')).toHaveLength(2));
    expect(within(invitesSection).getByText('Open')).toBeInTheDocument();
  });
});
