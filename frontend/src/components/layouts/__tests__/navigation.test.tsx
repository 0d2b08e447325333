import type { UserDto } from '@causeway/shared';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const EVERYONE = ['Home', 'Fault codes', 'Jobs', 'Vehicles', 'Imports'];
const SHOP_OWNER = ['Shop settings', 'Insights'];
const CONTRIBUTOR = ['Field reports'];
const MODERATOR = ['Review desk', 'Knowledge base'];
const ADMIN = ['Users', 'Audit log'];

async function navigationFor(user: UserDto): Promise<string[]> {
  await renderApp('/', { user });
  const nav = await screen.findByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('menuitem')
    .map((item) => item.textContent ?? '');
}

describe('Side navigation', () => {
  it('shows a technician only the everyday sections', async () => {
    expect(await navigationFor(makeUser({ role: 'technician' }))).toEqual(EVERYONE);
  });

  it('adds shop settings and insights for the owner of a shop, whatever the role', async () => {
    expect(await navigationFor(makeUser({ role: 'technician', shopOwner: true }))).toEqual([...EVERYONE, ...SHOP_OWNER]);
  });

  it('shows the admin-only sections to admins, but not shop settings unless they own a shop', async () => {
    expect(await navigationFor(makeUser({ role: 'admin', shopOwner: false }))).toEqual([...EVERYONE, ...CONTRIBUTOR, ...MODERATOR, ...ADMIN]);
  });

  it('keeps admin sections from moderators', async () => {
    const items = await navigationFor(makeUser({ role: 'moderator', shopOwner: true }));
    expect(items).toEqual([...EVERYONE, ...SHOP_OWNER, ...CONTRIBUTOR, ...MODERATOR]);
    expect(items).not.toContain('Users');
  });

  it('says who is signed in, in which shop, and moves between pages', async () => {
    const app = await renderApp('/', { user: makeUser({ displayName: 'Robin Tester', role: 'contributor' }) });
    const header = screen.getByRole('banner');
    expect(within(header).getByText('Robin Tester')).toBeInTheDocument();
    expect(within(header).getByText('Contributor')).toBeInTheDocument();
    expect(within(header).getByText('Test Bay Motors')).toBeInTheDocument();

    await app.user.click(within(screen.getByRole('navigation', { name: 'Main' })).getByRole('menuitem', { name: 'Field reports' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Field reports' })).toBeInTheDocument();
    expect(app.router.state.location.pathname).toBe('/reports');

    const toggle = screen.getByRole('button', { name: 'Collapse the navigation' });
    expect(toggle).toHaveAttribute('aria-expanded', 'true');
    await app.user.click(toggle);
    expect(screen.getByRole('button', { name: 'Expand the navigation' })).toHaveAttribute('aria-expanded', 'false');
  });

  it('refuses an admin page to a technician who types its address, without asking the server', async () => {
    const app = await renderApp('/admin/users', { user: makeUser({ role: 'technician' }) });
    expect(await screen.findByText('This page is not open to your account')).toBeInTheDocument();
    expect(app.server.calls('GET /api/admin/users')).toHaveLength(0);
  });

  it('refuses shop settings to a member who does not own the shop', async () => {
    await renderApp('/shop', { user: makeUser({ role: 'admin', shopOwner: false }) });
    expect(await screen.findByText('Only the owner of the shop can use it.')).toBeInTheDocument();
  });
});
