import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';
import { createCodeSearch } from '../utils/code-search';
import { CODE_INDEX } from './codes-test-data';

describe('Fuzzy code search', () => {
  it('finds P0456 for "very small leak", in the browser, from the catalogue fetched once', async () => {
    const app = await renderApp('/codes', {
      user: makeUser(),
      api: {
        'GET /api/codes/index': ok(CODE_INDEX),
        'GET /api/codes': ok({ items: [], total: 0, page: 1, pageSize: 25 }),
      },
    });
    const field = screen.getByRole('searchbox', { name: 'Search by what it says' });

    await app.user.type(field, 'very small leak');

    const results = screen.getByRole('list', { name: 'Search results' });
    const first = (await within(results).findAllByRole('link'))[0];
    expect(first).toHaveTextContent('P0456');
    expect(first).toHaveAttribute('href', '/codes/P0456');

    await app.user.clear(field);
    await app.user.type(field, 'smal leek');
    expect(await within(results).findByRole('link', { name: /P0442/ })).toBeInTheDocument();

    expect(app.server.calls('GET /api/codes/index')).toHaveLength(1);
  });

  it('puts a whole code first, however it was written, and lists the codes a prefix starts', () => {
    const search = createCodeSearch(CODE_INDEX);
    expect(search('04 56')[0].code).toBe('P0456');
    expect(search('po45').map((e) => e.code)).toEqual(['P0455', 'P0456']);
    expect(search('')).toEqual([]);
  });
});
