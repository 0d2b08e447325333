import type { AuditEntryDto, Page } from '@causeway/shared';
import { cleanup, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const admin = makeUser({ role: 'admin', email: 'admin@example.test', displayName: 'Ada Admin', shop: null });

const entry: AuditEntryDto = {
  id: 'a1',
  at: '2026-11-30T14:00:00.000Z',
  actorId: 'm1',
  actorEmail: 'moderator@example.test',
  action: 'cause.update',
  entityType: 'possible-cause',
  entityId: 'c-123',
  before: { prior: 0.3, partCostMinor: 2200 },
  after: { prior: 0.25, partCostMinor: 2200 },
  note: null,
};

const page: Page<AuditEntryDto> = { items: [entry], total: 1, page: 1, pageSize: 25 };

// Warm-up: the first render of a page loads its lazy modules and computes antd's styles, which on a
// busy machine outlasts the page-load wait of renderApp. Done once here, it stays out of the tests.
beforeAll(async () => {
  await renderApp('/admin/audit', { user: admin, api: { 'GET /api/admin/audit': ok(page) } }).catch(() => undefined);
  cleanup();
  window.localStorage.clear();
}, 60_000);

describe('Audit log', () => {
  it('reads its filters from the address, writes new ones back and shows before and after', async () => {
    const app = await renderApp('/admin/audit?action=cause.&page=2', { user: admin, api: { 'GET /api/admin/audit': ok(page) } });

    expect(await screen.findByText('moderator@example.test')).toBeInTheDocument();
    expect(Object.fromEntries(app.server.calls('GET /api/admin/audit')[0].query)).toEqual({ page: '2', pageSize: '25', action: 'cause.' });

    await app.user.type(screen.getByLabelText('Who (e-mail or user id)'), 'moderator');
    await app.user.type(screen.getByLabelText('From'), '2026-11-01');
    await app.user.type(screen.getByLabelText('To'), '2026-11-30');
    await app.user.click(screen.getByRole('button', { name: 'Filter' }));

    await waitFor(() => expect(app.router.state.location.search).toBe('?actor=moderator&action=cause.&from=2026-11-01&to=2026-11-30'));
    await waitFor(() =>
      expect(Object.fromEntries(app.server.calls('GET /api/admin/audit').at(-1)!.query)).toEqual({
        page: '1',
        pageSize: '25',
        actor: 'moderator',
        action: 'cause.',
        from: '2026-11-01',
        to: '2026-11-30',
      }),
    );

    // A row opens to its before and after, side by side (once the new page has arrived).
    await waitFor(() => expect(document.querySelector('.ant-spin-spinning')).toBeNull());
    await app.user.click(screen.getByRole('button', { name: /expand row/i }));
    expect(await screen.findByRole('region', { name: 'Before' })).toHaveTextContent('"prior": 0.3');
    expect(screen.getByRole('region', { name: 'After' })).toHaveTextContent('"prior": 0.25');
    expect(screen.getByText('prior')).toBeInTheDocument();

    await app.user.click(screen.getByRole('button', { name: 'Clear the filters' }));
    await waitFor(() => expect(app.router.state.location.search).toBe(''));
  }, 60_000);
});
