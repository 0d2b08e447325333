import type { CodeSummaryDto, Page } from '@causeway/shared';
import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp, waitForPageLoaded } from '@/testing/test-utils';
import { CODE_INDEX } from './codes-test-data';

function page(items: CodeSummaryDto[], overrides: Partial<Page<CodeSummaryDto>> = {}): Page<CodeSummaryDto> {
  return { items, total: items.length, page: 1, pageSize: 25, ...overrides };
}

const rows: CodeSummaryDto[] = CODE_INDEX.map(({ symptoms: _symptoms, ...row }) => row);

describe('Browse table', () => {
  it('takes page and filters from the address and writes changes back to it', async () => {
    const app = await renderApp('/codes?q=leak&system=P&page=2', {
      user: makeUser(),
      api: { 'GET /api/codes': ok(page(rows, { total: 60, page: 2 })) },
    });

    expect(await screen.findByRole('link', { name: 'U0100' })).toBeInTheDocument();
    expect(Object.fromEntries(app.server.calls('GET /api/codes')[0].query)).toEqual({ page: '2', pageSize: '25', q: 'leak', system: 'P' });
    expect(screen.getByRole('searchbox', { name: 'Filter the catalogue by code prefix or words' })).toHaveValue('leak');

    // Going to another page keeps the filters.
    await app.user.click(screen.getByRole('listitem', { name: '3' }));
    await waitFor(() => expect(app.router.state.location.search).toBe('?q=leak&system=P&page=3'));
    expect(Object.fromEntries(app.server.calls('GET /api/codes').at(-1)!.query)).toMatchObject({ page: '3', q: 'leak', system: 'P' });

    // A new filter starts again at page 1.
    await app.user.click(screen.getByRole('combobox', { name: 'Who controls it' }));
    await app.user.click(await screen.findByTitle('Manufacturer-controlled'));
    await waitFor(() => expect(app.router.state.location.search).toBe('?q=leak&system=P&control=manufacturer'));

    // Sorting by a column goes into the address too (once the rows have loaded).
    await waitForPageLoaded();
    await app.user.click(screen.getByRole('columnheader', { name: /Title/ }));
    await waitFor(() => expect(app.router.state.location.search).toBe('?q=leak&system=P&control=manufacturer&sort=title&order=asc'));
    expect(Object.fromEntries(app.server.calls('GET /api/codes').at(-1)!.query)).toEqual({
      page: '1',
      pageSize: '25',
      q: 'leak',
      system: 'P',
      control: 'manufacturer',
      sort: 'title',
      order: 'asc',
    });
  });
});
