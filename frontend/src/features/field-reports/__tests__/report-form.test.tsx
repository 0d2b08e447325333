import { cleanup, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { fail, ok } from '@/testing/mock-api';
import { makeShop, makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const contributor = makeUser({ role: 'contributor', displayName: 'Cara Contributor', shop: makeShop({ currency: 'EUR', locale: 'en-IE', distanceUnit: 'km' }) });

const api = {
  'GET /api/dtc/decode': ok({ input: 'P0171', structure: {}, known: { title: 'System Too Lean (Bank 1)', make: null }, status: null }),
  'GET /api/causes': ok([]),
  'GET /api/parts': ok([{ key: 'maf-sensor', name: 'Mass air flow sensor', system: 'air-intake' }]),
  'GET /api/teardowns': ok([]),
  'POST /api/field-reports': fail(400, {
    error: 'Bad Request',
    message: 'Validation failed',
    errors: [{ field: 'payload.prior', message: 'must be a number between 0 and 1' }],
  }),
};

// Warm-up: the first render of a page loads its lazy modules and computes antd's styles, which on a
// busy machine outlasts the page-load wait of renderApp. Done once here, it stays out of the tests.
beforeAll(async () => {
  await renderApp('/reports/new', { user: contributor, api: api }).catch(() => undefined);
  cleanup();
  window.localStorage.clear();
}, 60_000);

describe('Field report form', () => {
  it('files a new possible cause and puts the server error on the prior field', async () => {
    const app = await renderApp('/reports/new', { user: contributor, api });

    await app.user.click(await screen.findByText('New possible cause'));
    const fill = async (label: string, text: string) => {
      await app.user.click(screen.getByLabelText(label));
      await app.user.paste(text);
    };
    await fill('Fault code', 'p0171');
    // The codec's reading and the catalogue title are shown under the code.
    expect(await screen.findByText('System Too Lean (Bank 1)')).toBeInTheDocument();
    expect(screen.getByTestId('code-reading')).toHaveTextContent('Read as P0171');

    await app.user.click(screen.getByRole('switch', { name: 'The part is not in the list yet' }));
    await fill('Name of the new part', 'Turbo diverter valve');
    await fill('Key of the new part', 'turbo-diverter-valve');
    await fill('Proposed prior', '5');
    await fill('Part cost', '68.50');
    await fill('Labour hours to replace', '0.6');
    await app.user.click(screen.getByRole('button', { name: 'Submit for review' }));

    await waitFor(() => expect(app.server.calls('POST /api/field-reports')).toHaveLength(1));
    const body = app.server.calls('POST /api/field-reports')[0].body as { kind: string; submit: boolean; payload: Record<string, unknown> };
    expect(body.kind).toBe('new-cause');
    expect(body.submit).toBe(true);
    expect(body.payload).toMatchObject({ code: 'P0171', part: 'turbo-diverter-valve', partName: 'Turbo diverter valve', prior: 0.05, partCostMinor: 6850, currency: 'EUR', replaceHours: 0.6 });

    // The server's words, in the form's terms, on the field they belong to.
    const message = await screen.findByText('Proposed prior must be a number between 0 % and 100 %');
    const item = screen.getByLabelText('Proposed prior').closest('.ant-form-item');
    expect(item).toContainElement(message);
    expect(app.router.state.location.pathname).toBe('/reports/new');
    // A heavy form on a first render: allow for a slow machine.
  }, 60_000);
});
