import type { EstimateAnswerDto, PublicEstimateDto } from '@causeway/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { FUEL_CAUTION, makeFixPath } from '@/testing/job-data';
import { fail, jsonResponse, ok } from '@/testing/mock-api';
import { renderApp, waitForPageLoaded } from '@/testing/test-utils';
import { buildStages } from '@causeway/shared';

const TOKEN = 'Zm9vYmFyYmF6cXV4cXV1eGNvcmdlZ3JhdWx0Z2FycGx5';
const URL = `/api/public/estimates/${TOKEN}`;

function makePublicEstimate(overrides: Partial<PublicEstimateDto> = {}): PublicEstimateDto {
  const fixPath = makeFixPath('P0456', [
    { key: 'purge-valve', label: 'EVAP purge valve', probability: 0.5, replaceCost: 8_000 },
    { key: 'vent-valve', label: 'EVAP vent valve', probability: 0.4, replaceCost: 9_000 },
  ], { unlistedProbability: 0.1 });
  const { stages, totals } = buildStages([{ code: 'P0456', title: 'Evaporative system leak (test)', fixPath }], 2_000);
  return {
    shop: { name: 'Test Bay Motors' },
    vehicle: { make: 'Halden', model: 'Tarn', year: 2019, plate: 'TE57 ABC' },
    complaint: 'Warning lamp after refuelling (test)',
    codes: [{ code: 'P0456', title: 'Evaporative system leak (test)' }],
    message: null,
    currency: 'GBP',
    locale: 'en-GB',
    taxRateBp: 2_000,
    createdAt: '2026-03-02T09:00:00.000Z',
    expiresAt: '2026-03-16T09:00:00.000Z',
    stages,
    totals,
    decisions: stages.map(() => null),
    answers: [],
    rounding: 'Rounded per stage (test).',
    note: 'A staged estimate (test).',
    acceptingAnswers: true,
    ...overrides,
  };
}

beforeAll(async () => {
  await import('@/app/routes/public-estimate');
}, 60_000);

describe('Public staged estimate', () => {
  it('lets the owner approve a stage, without an account', async () => {
    let estimate = makePublicEstimate();
    const app = await renderApp(`/estimate/${TOKEN}`, {
      api: {
        [`GET ${URL}`]: () => jsonResponse(200, estimate),
        [`POST ${URL}/answers`]: (request) => {
          const body = request.body as { stageIndex: number; decision: 'approved' | 'declined'; name?: string };
          const answer: EstimateAnswerDto = { stageIndex: body.stageIndex, decision: body.decision, name: body.name ?? null, answeredAt: '2026-03-03T10:15:00.000Z' };
          estimate = { ...estimate, answers: [answer], decisions: estimate.decisions.map((d, i) => (i === body.stageIndex ? answer : d)) };
          return jsonResponse(201, estimate);
        },
      },
    });
    await waitForPageLoaded();
    expect(await screen.findByRole('heading', { level: 1, name: 'Staged estimate for your 2019 Halden Tarn · TE57 ABC' })).toBeInTheDocument();
    // No signed-in frame around it.
    expect(screen.queryByRole('navigation', { name: 'Main' })).not.toBeInTheDocument();

    const first = screen.getByRole('listitem', { name: /^Stage 1:/ });
    // Each stage priced before tax, the tax and with tax, in the shop's currency.
    const net = estimate.stages[0].price;
    expect(within(first).getByTestId('price-net')).toHaveTextContent(`£${(net.net / 100).toFixed(2)}`);
    expect(within(first).getByTestId('price-gross')).toHaveTextContent(`£${(net.gross / 100).toFixed(2)}`);
    expect(screen.getAllByText(/Safety: Fuel and fuel vapour/).length).toBeGreaterThan(0);
    expect(screen.getByRole('note', { name: `Safety: ${FUEL_CAUTION.title}` })).toBeInTheDocument();

    await app.user.type(screen.getByLabelText(/Your name/), 'Pat Owner');
    await app.user.click(within(first).getByRole('button', { name: 'Approve stage 1' }));

    await waitFor(() => expect(app.server.calls(`POST ${URL}/answers`)).toHaveLength(1));
    expect(app.server.calls(`POST ${URL}/answers`)[0].body).toEqual({ stageIndex: 0, decision: 'approved', name: 'Pat Owner' });
    expect(await within(screen.getByRole('listitem', { name: /^Stage 1:/ })).findByTestId('stage-decision')).toHaveTextContent(/Approved by Pat Owner on/);
    expect(within(screen.getByRole('listitem', { name: /^Stage 2:/ })).queryByTestId('stage-decision')).not.toBeInTheDocument();
  });

  it('says plainly that an expired link has expired and to contact the shop', async () => {
    await renderApp(`/estimate/${TOKEN}`, {
      api: {
        [`GET ${URL}`]: fail(410, { error: 'Gone', message: 'This estimate link expired on 16 March 2026. Please ask Test Bay Motors to send a new one.' }),
      },
    });
    await waitForPageLoaded();
    expect(await screen.findByText('This estimate link has expired')).toBeInTheDocument();
    expect(screen.getByText('This estimate link expired on 16 March 2026. Please ask Test Bay Motors to send a new one.')).toBeInTheDocument();
    expect(screen.getByText(/Please contact the garage: they can send you a new link/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Approve/ })).not.toBeInTheDocument();
  });

  it('takes no answers once the job is closed', async () => {
    await renderApp(`/estimate/${TOKEN}`, { api: { [`GET ${URL}`]: ok(makePublicEstimate({ acceptingAnswers: false })) } });
    await waitForPageLoaded();
    expect(await screen.findByText(/This job is closed, so Test Bay Motors no longer takes answers here/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Approve stage/ })).not.toBeInTheDocument();
  });
});
