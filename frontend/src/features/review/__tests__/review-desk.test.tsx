import type { FieldReportSummaryDto, Page, ReviewReportDto } from '@causeway/shared';
import { cleanup, screen, waitFor } from '@testing-library/react';
import { beforeAll, describe, expect, it } from 'vitest';
import { jsonResponse, ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

const moderator = makeUser({ id: 'c0000000-0000-4000-8000-00000000000c', email: 'mod@example.test', displayName: 'Mina Moderator', role: 'moderator', shop: null });
const REPORT_ID = 'd0000000-0000-4000-8000-00000000000d';

function likelihood(probability: number, evidence = 0) {
  return { probability, lower: Math.max(0, probability - 0.1), upper: Math.min(1, probability + 0.1), evidence, inheritedEvidence: 0, priorWeight: probability };
}

function makeReport(overrides: Partial<ReviewReportDto> = {}): ReviewReportDto {
  return {
    id: REPORT_ID,
    kind: 'confirmed-fix',
    status: 'submitted',
    code: 'P0303',
    title: 'P0303 fixed by Ignition coil on Morrow Strand 3.0 V6 2018',
    proposesNewCode: false,
    author: { id: 'e0000000-0000-4000-8000-00000000000e', displayName: 'Cara Contributor' },
    attachmentCount: 0,
    createdAt: '2026-11-20T10:00:00.000Z',
    updatedAt: '2026-11-20T10:00:00.000Z',
    submittedAt: '2026-11-20T10:05:00.000Z',
    decidedAt: null,
    payload: { code: 'P0303', make: 'Morrow', model: 'Strand', engine: '3.0 V6', year: 2018, part: 'ignition-coil', odometerKm: 88400, triedFirst: [], notes: 'Swap test' },
    attachments: [],
    decidedBy: null,
    decisionNote: null,
    notifiedAt: null,
    diff: {
      summary: 'Counts one verified fix of P0303 by Ignition coil on Morrow Strand 3.0 V6 2018: its likelihood goes from 38.0 % to 43.6 %.',
      target: { entityType: 'outcome', entityId: null, label: 'P0303 on Morrow Strand 3.0 V6 2018' },
      changes: [
        { field: 'evidence', label: 'Outcomes counted for P0303 on Morrow Strand 3.0 V6 2018', before: 0, after: 1 },
        { field: 'probability', label: 'Likelihood of Ignition coil', before: 0.38, after: 0.436 },
      ],
      likelihoods: {
        vehicle: { make: 'Morrow', model: 'Strand', engine: '3.0 V6', year: 2018 },
        listScope: { make: 'Morrow', model: 'Strand', engine: '3.0 V6', yearFrom: 2014, yearTo: null },
        priorStrength: 10,
        evidenceBefore: 0,
        evidenceAfter: 1,
        capped: false,
        causes: [
          { key: 'ignition-coil', partName: 'Ignition coil', before: likelihood(0.38), after: likelihood(0.436, 1), subject: true },
          { key: 'spark-plug', partName: 'Spark plug', before: likelihood(0.27), after: likelihood(0.245), subject: false },
        ],
        unlisted: { before: likelihood(0.1), after: likelihood(0.09) },
      },
      warnings: [],
      applicable: true,
      blockers: [],
    },
    ...overrides,
  };
}

const emptyQueue: Page<FieldReportSummaryDto> = { items: [], total: 0, page: 1, pageSize: 25 };

function api(report: ReviewReportDto) {
  return {
    'GET /api/review/reports/d0000000-0000-4000-8000-00000000000d': ok(report),
    'GET /api/review/reports': ok(emptyQueue),
    'GET /api/parts': ok([{ key: 'ignition-coil', name: 'Ignition coil', system: 'ignition' }]),
    'POST /api/review/reports/d0000000-0000-4000-8000-00000000000d/approve': () => jsonResponse(200, { ...report, status: 'approved' }),
    'POST /api/review/reports/d0000000-0000-4000-8000-00000000000d/reject': () => jsonResponse(200, { ...report, status: 'rejected' }),
  };
}

// Warm-up: the first render of a page loads its lazy modules and computes antd's styles, which on a
// busy machine outlasts the page-load wait of renderApp. Done once here, it stays out of the tests.
beforeAll(async () => {
  await renderApp(`/review/${REPORT_ID}`, { user: moderator, api: api(makeReport()) }).catch(() => undefined);
  cleanup();
  window.localStorage.clear();
}, 60_000);

describe('Review desk', () => {
  it('shows the before/after, requires a reason to reject and posts it', async () => {
    const app = await renderApp(`/review/${REPORT_ID}`, { user: moderator, api: api(makeReport()) });

    expect(await screen.findByText(/its likelihood goes from 38.0 % to 43.6 %/)).toBeInTheDocument();
    // Now and after approval, side by side: the subject's likelihood and the evidence count.
    expect(screen.getAllByRole('columnheader', { name: 'After approval' })).toHaveLength(2);
    expect(screen.getAllByText('38%').length).toBeGreaterThan(0);
    expect(screen.getAllByText('44%').length).toBeGreaterThan(0);

    // No reason: the form says so and nothing is sent.
    await app.user.click(screen.getByRole('button', { name: 'Reject report' }));
    expect(await screen.findByText('Give the reason for rejecting the report')).toBeInTheDocument();
    expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/reject`)).toHaveLength(0);

    await app.user.type(screen.getByLabelText('Reason'), '  The photo does not show the coil.  ');
    await app.user.click(screen.getByRole('button', { name: 'Reject report' }));

    await waitFor(() => expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/reject`)).toHaveLength(1));
    expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/reject`)[0].body).toEqual({ reason: 'The photo does not show the coil.' });
    expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/approve`)).toHaveLength(0);
    await waitFor(() => expect(app.router.state.location.pathname).toBe('/review'));
  }, 60_000);

  it('approves with an optional note', async () => {
    const app = await renderApp(`/review/${REPORT_ID}`, { user: moderator, api: api(makeReport()) });

    await app.user.type(await screen.findByLabelText('Note to the contributor (optional)'), 'Convincing swap test');
    await app.user.click(screen.getByRole('button', { name: 'Approve report' }));

    await waitFor(() => expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/approve`)).toHaveLength(1));
    expect(app.server.calls(`POST /api/review/reports/${REPORT_ID}/approve`)[0].body).toEqual({ note: 'Convincing swap test' });
    expect(await screen.findByText(/Report approved/)).toBeInTheDocument();
  });

  it("does not let a moderator decide their own report", async () => {
    const own = makeReport({
      author: { id: moderator.id, displayName: moderator.displayName },
      diff: { ...makeReport().diff, applicable: false, blockers: ['This is your own report: another moderator must decide it.'] },
    });
    await renderApp(`/review/${REPORT_ID}`, { user: moderator, api: api(own) });

    expect(await screen.findByText('You cannot decide your own report')).toBeInTheDocument();
    expect(screen.getByText('This is your own report: another moderator must decide it.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Approve report' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Reject report' })).not.toBeInTheDocument();
  });
});
