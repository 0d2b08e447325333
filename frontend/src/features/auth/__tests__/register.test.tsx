import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TOKEN_STORAGE_KEY } from '@/lib/auth-token';
import { fail, ok } from '@/testing/mock-api';
import { makeAuthResponse, makeShop, makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

/** The form item (label, control and its messages) around the control labelled `label`. */
function field(label: string | RegExp): HTMLElement {
  const item = screen.getByLabelText(label).closest<HTMLElement>('.ant-form-item');
  if (!item) throw new Error(`No form item around ${String(label)}`);
  return item;
}

async function fillAccount(app: Awaited<ReturnType<typeof renderApp>>) {
  await app.user.type(await screen.findByLabelText('Your name'), 'Alex Rivera');
  await app.user.type(screen.getByLabelText('E-mail'), 'alex@example.test');
  await app.user.type(screen.getByLabelText('Password'), 'spanner2024ok');
  await app.user.type(screen.getByLabelText('Repeat the password'), 'spanner2024ok');
}

describe('Register', () => {
  it('starts a new shop, sending the labour rate in minor units and the tax in basis points', async () => {
    const owner = makeUser({ displayName: 'Alex Rivera', shopOwner: true, shop: makeShop({ name: 'Rivera Auto', currency: 'USD', locale: 'en-US', labourRateMinor: 9550, taxRateBp: 825 }) });
    const app = await renderApp('/register', { api: { 'POST /api/auth/register': ok(makeAuthResponse(owner, 'owner-token')) } });

    expect(screen.getByText(/at least 10 characters, with at least one letter and one digit/)).toBeInTheDocument();
    await fillAccount(app);
    await app.user.type(screen.getByLabelText('Shop name'), 'Rivera Auto');
    await app.user.type(screen.getByLabelText(/Labour rate per hour/), '95.5');
    await app.user.type(screen.getByLabelText(/Tax rate/), '8.25');
    await app.user.click(screen.getByRole('button', { name: 'Create account and shop' }));

    expect(await screen.findByRole('heading', { name: 'Welcome, Alex Rivera' })).toBeInTheDocument();
    const [request] = app.server.calls('POST /api/auth/register');
    // jsdom's browser locale is en-US, which the new-shop defaults follow.
    expect(request.body).toEqual({
      displayName: 'Alex Rivera',
      email: 'alex@example.test',
      password: 'spanner2024ok',
      shop: { name: 'Rivera Auto', currency: 'USD', locale: 'en-US', labourRateMinor: 9550, taxRateBp: 825, distanceUnit: 'mi' },
    });
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBe('owner-token');
  });

  it("shows the server's field errors on the fields they belong to", async () => {
    const app = await renderApp('/register', {
      api: {
        'POST /api/auth/register': fail(400, {
          error: 'Bad Request',
          message: 'email: is already registered; shop.labourRateMinor: labourRateMinor must not be greater than 10000000',
          errors: [
            { field: 'email', message: 'is already registered' },
            { field: 'shop.labourRateMinor', message: 'labourRateMinor must not be greater than 10000000' },
            { field: 'shop.locale', message: 'must be a supported locale such as en-GB or de-DE' },
          ],
        }),
      },
    });

    await fillAccount(app);
    await app.user.type(screen.getByLabelText('Shop name'), 'Rivera Auto');
    await app.user.type(screen.getByLabelText(/Labour rate per hour/), '200000');
    await app.user.type(screen.getByLabelText(/Tax rate/), '20');
    await app.user.click(screen.getByRole('button', { name: 'Create account and shop' }));

    expect(await within(field('E-mail')).findByText('E-mail is already registered')).toBeInTheDocument();
    expect(within(field(/Labour rate per hour/)).getByText('Labour rate must not be greater than 10000000')).toBeInTheDocument();
    expect(within(field('Number format')).getByText('Number format must be a supported locale such as en-GB or de-DE')).toBeInTheDocument();
    // Every error found its field, so there is no summary above the form.
    expect(screen.queryByText(/email: is already registered/)).not.toBeInTheDocument();
    expect(window.localStorage.getItem(TOKEN_STORAGE_KEY)).toBeNull();
  });

  it('joins a shop with an invite code and shows a refused code on its field', async () => {
    const app = await renderApp('/register', {
      api: {
        'POST /api/auth/register': fail(400, {
          message: 'The invite code is unknown, used or expired',
          errors: [{ field: 'inviteCode', message: 'is unknown, already used or expired' }],
        }),
      },
    });

    await app.user.click(await screen.findByText('Join a shop with an invite code'));
    expect(screen.queryByLabelText('Shop name')).not.toBeInTheDocument();
    await fillAccount(app);
    await app.user.type(screen.getByLabelText('Invite code'), ' KLG-7Q2M ');
    await app.user.click(screen.getByRole('button', { name: 'Create account and join the shop' }));

    expect(await within(field('Invite code')).findByText('Invite code is unknown, already used or expired')).toBeInTheDocument();
    expect(app.server.calls('POST /api/auth/register')[0].body).toEqual({
      displayName: 'Alex Rivera',
      email: 'alex@example.test',
      password: 'spanner2024ok',
      inviteCode: 'KLG-7Q2M',
    });
  });
});
