import { screen, waitFor, within } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { fail, jsonResponse, ok } from '@/testing/mock-api';
import { makeFixPath, makeJob, makeJobCode, makeVehicle, TEST_JOB_ID, TEST_VEHICLE_ID } from '@/testing/job-data';
import { makeUser } from '@/testing/test-data';
import { renderApp, waitForPageLoaded } from '@/testing/test-utils';

const JOB = `/api/jobs/${TEST_JOB_ID}`;
const purge = { key: 'purge-valve', label: 'EVAP purge valve', probability: 0.3, replaceCost: 8_000, checkCost: 1_500 };
const vent = { key: 'vent-valve', label: 'EVAP vent valve', probability: 0.6, replaceCost: 9_000, checkCost: 1_900 };

const before = makeJob([makeJobCode(makeFixPath('P0456', [purge, vent], { unlistedProbability: 0.1, escalationCost: 40_000 }))]);
const after = makeJob(
  [
    makeJobCode(makeFixPath('P0456', [{ ...vent, probability: 6 / 7 }], { unlistedProbability: 1 / 7, escalationCost: 40_000 }), {
      excludedParts: ['purge-valve'],
    }),
  ],
  {
    stepCount: 1,
    actualCostMinor: 1_500,
    steps: [
      {
        id: 's1',
        sequence: 1,
        code: 'P0456',
        kind: 'check',
        parts: [{ key: 'purge-valve', label: 'EVAP purge valve' }],
        result: 'not-at-fault',
        actualCostMinor: 1_500,
        notes: 'Holds vacuum',
        at: '2026-03-02T10:00:00.000Z',
        recordedBy: { id: 'u1', displayName: 'Robin Tester' },
      },
    ],
  },
);

function stageTitles(): string[] {
  return within(screen.getByTestId('fix-path-P0456'))
    .getAllByTestId('fix-path-stage')
    .map((el) => el.textContent ?? '');
}

// The job page is a large lazy route; load it once up front, so a cold transform on a busy machine
// is not counted against the wait for the page to render.
beforeAll(async () => {
  await Promise.all([import('@/app/routes/app/root'), import('@/app/routes/app/job')]);
}, 60_000);

describe('Job page', () => {
  it('records a step with the right body, reads the job again and shows the new fix path', async () => {
    let current = before;
    const app = await renderApp(`/jobs/${TEST_JOB_ID}`, {
      user: makeUser(),
      api: {
        [`GET ${JOB}`]: () => jsonResponse(200, current),
        [`GET /api/vehicles/${TEST_VEHICLE_ID}`]: ok(makeVehicle()),
        [`GET ${JOB}/estimates`]: ok([]),
        [`POST ${JOB}/steps`]: () => {
          current = after;
          return jsonResponse(201, after);
        },
      },
    });
    await waitForPageLoaded();
    expect(await screen.findByRole('heading', { level: 1, name: /2019 Halden Tarn 1.6 T · TE57 ABC/ })).toBeInTheDocument();
    expect(stageTitles().some((t) => t.includes('EVAP purge valve'))).toBe(true);

    await app.user.click(screen.getByRole('combobox', { name: /Part checked/ }));
    await app.user.click(await screen.findByTitle('EVAP purge valve'));
    // The plan's figure is offered as the cost: the check of £15.00.
    await waitFor(() => expect(screen.getByRole('spinbutton', { name: /Actual cost before tax/ })).toHaveValue('15.00'));
    await app.user.click(screen.getByRole('radio', { name: 'Not at fault' }));
    await app.user.type(screen.getByRole('textbox', { name: /Notes/ }), 'Holds vacuum');
    await app.user.click(screen.getByRole('button', { name: 'Record the step' }));

    await waitFor(() => expect(app.server.calls(`POST ${JOB}/steps`)).toHaveLength(1));
    expect(app.server.calls(`POST ${JOB}/steps`)[0].body).toEqual({
      code: 'P0456',
      kind: 'check',
      parts: ['purge-valve'],
      result: 'not-at-fault',
      actualCostMinor: 1_500,
      notes: 'Holds vacuum',
    });
    // The job is read again, and the path no longer holds the part ruled out.
    await waitFor(() => expect(app.server.calls(`GET ${JOB}`).length).toBeGreaterThanOrEqual(2));
    await waitFor(() => expect(stageTitles().some((t) => t.includes('EVAP purge valve'))).toBe(false));
    expect(screen.getByText(/Ruled out in this job: EVAP purge valve/)).toBeInTheDocument();
    expect(within(screen.getByRole('list', { name: 'Timeline of steps' })).getByText('Checked EVAP purge valve: not at fault')).toBeInTheDocument();
  });

  it('says clearly when the job was closed meanwhile (409)', async () => {
    const app = await renderApp(`/jobs/${TEST_JOB_ID}`, {
      user: makeUser(),
      api: {
        [`GET ${JOB}`]: ok(before),
        [`GET /api/vehicles/${TEST_VEHICLE_ID}`]: ok(makeVehicle()),
        [`GET ${JOB}/estimates`]: ok([]),
        [`POST ${JOB}/steps`]: fail(409, { error: 'Conflict', message: 'This job is closed: it no longer takes steps, estimates or a second close' }),
      },
    });
    await waitForPageLoaded();
    await app.user.click(await screen.findByRole('combobox', { name: /Part checked/ }));
    await app.user.click(await screen.findByTitle('EVAP vent valve'));
    await app.user.click(screen.getByRole('radio', { name: 'At fault' }));
    await app.user.click(screen.getByRole('button', { name: 'Record the step' }));

    expect(await screen.findByText('This job is closed')).toBeInTheDocument();
    expect(screen.getAllByText('This job is closed: it no longer takes steps, estimates or a second close').length).toBeGreaterThan(0);
  });

  it('prepares a staged estimate priced before tax, with tax and with tax included, and says when the e-mail did not go', async () => {
    // One part at £100.00 plus a £20.00 verification: a stage of £120.00 before tax; 20 % VAT makes £144.00 (product.md).
    const single = makeJob([makeJobCode(makeFixPath('P0456', [{ key: 'vent-valve', label: 'EVAP vent valve', probability: 1, replaceCost: 10_000 }], { verificationCost: 2_000 }))]);
    const app = await renderApp(`/jobs/${TEST_JOB_ID}`, {
      user: makeUser(),
      api: {
        [`GET ${JOB}`]: ok(single),
        [`GET /api/vehicles/${TEST_VEHICLE_ID}`]: ok(makeVehicle({ ownerEmail: 'owner@example.test' })),
        [`GET ${JOB}/estimates`]: ok([]),
        [`POST ${JOB}/estimates`]: (request) =>
          jsonResponse(201, {
            estimate: { id: 'e1', recipientEmail: 'owner@example.test', expiresAt: '2026-03-16T09:00:00.000Z', request: request.body },
            link: 'http://localhost/estimate/abc',
            emailed: false,
            emailError: 'The e-mail was not sent: connection refused. The estimate is saved; send it again later or hand over the link.',
          }),
      },
    });
    await waitForPageLoaded();
    await app.user.click(await screen.findByRole('button', { name: 'Prepare estimate' }));

    const drawer = await screen.findByRole('dialog', { name: 'Prepare a staged estimate' });
    const stage = within(drawer).getByRole('listitem', { name: 'Stage 1: Replace EVAP vent valve' });
    expect(within(stage).getByTestId('price-net')).toHaveTextContent('£120.00');
    expect(within(stage).getByTestId('price-tax')).toHaveTextContent('£24.00');
    expect(within(stage).getByTestId('price-gross')).toHaveTextContent('£144.00');
    expect(within(stage).getByText('Tax (20%)')).toBeInTheDocument();
    expect(within(drawer).getByText(/Leave empty to send it to the owner's address on file, owner@example.test/)).toBeInTheDocument();

    await app.user.click(within(drawer).getByRole('button', { name: /Send to owner/ }));
    expect(await within(drawer).findByText('The estimate is saved, but it was not e-mailed')).toBeInTheDocument();
    expect(within(drawer).getByText(/connection refused/)).toBeInTheDocument();
    expect(within(drawer).getByTestId('estimate-link')).toHaveAttribute('href', 'http://localhost/estimate/abc');
    expect(app.server.calls(`POST ${JOB}/estimates`)[0].body).toEqual({});
  });
});
