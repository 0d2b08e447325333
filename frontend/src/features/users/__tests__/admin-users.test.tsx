import type { Page, UserDto } from '@causeway/shared';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const admin = makeUser({ id: 'a0000000-0000-4000-8000-000000000001', email: 'admin@example.test', displayName: 'Ada Admin', role: 'admin', shop: null });
const tech = makeUser({ id: 'b0000000-0000-4000-8000-000000000002', email: 'tech@example.test', displayName: 'Theo Tech' });

function page(items: UserDto[], overrides: Partial<Page<UserDto>> = {}): Page<UserDto> {
  return { items, total: items.length, page: 1, pageSize: 20, ...overrides };
}

describe('User administration', () => {
  it('takes page, order and search from the address and writes changes back to it', async () => {
    const app = await renderApp('/admin/users?page=2&sort=email&order=desc&q=theo', {
      user: admin,
      api: { 'GET /api/admin/users': ok(page([admin, tech], { total: 45, page: 2 })) },
    });

    expect(await screen.findByText('tech@example.test')).toBeInTheDocument();
    const first = app.server.calls('GET /api/admin/users')[0];
    expect(Object.fromEntries(first.query)).toEqual({ page: '2', pageSize: '20', q: 'theo', sort: 'email', order: 'desc' });
    expect(screen.getByRole('searchbox', { name: 'Search users by name or e-mail' })).toHaveValue('theo');

    // Sorting by another column starts again at page 1.
    await app.user.click(screen.getByRole('columnheader', { name: /Joined/ }));
    await waitFor(() => expect(app.router.state.location.search).toBe('?q=theo&sort=createdAt&order=asc'));
    expect(Object.fromEntries(app.server.calls('GET /api/admin/users').at(-1)!.query)).toEqual({ page: '1', pageSize: '20', q: 'theo', sort: 'createdAt', order: 'asc' });

    const search = screen.getByRole('searchbox', { name: 'Search users by name or e-mail' });
    await app.user.clear(search);
    await app.user.type(search, 'ada{Enter}');
    await waitFor(() => expect(app.router.state.location.search).toBe('?q=ada&sort=createdAt&order=asc'));
  });

  it('disables an account and shows the list as the server now has it', async () => {
    let users = [admin, tech];
    const app = await renderApp('/admin/users', {
      user: admin,
      api: {
        'GET /api/admin/users': () => jsonResponse(200, page(users)),
        'PATCH /api/admin/users/b0000000-0000-4000-8000-000000000002': (request) => {
          users = users.map((u) => (u.id === tech.id ? { ...u, ...(request.body as Partial<UserDto>) } : u));
          return jsonResponse(200, users[1]);
        },
      },
    });

    const toggle = await screen.findByRole('switch', { name: 'Account of tech@example.test enabled' });
    expect(toggle).toBeChecked();
    // Admins cannot lock themselves out.
    expect(screen.getByRole('switch', { name: 'Account of admin@example.test enabled' })).toBeDisabled();

    await app.user.click(toggle);

    await waitFor(() => expect(screen.getByRole('switch', { name: 'Account of tech@example.test enabled' })).not.toBeChecked());
    expect(app.server.calls('PATCH /api/admin/users/b0000000-0000-4000-8000-000000000002')[0].body).toEqual({ disabled: true });
    // The list was fetched again after the change.
    expect(app.server.calls('GET /api/admin/users').length).toBeGreaterThanOrEqual(2);
    expect(await screen.findByText("Theo Tech's account is disabled")).toBeInTheDocument();
  });
});
