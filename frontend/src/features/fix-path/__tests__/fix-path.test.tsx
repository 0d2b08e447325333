import { formatMoney, planFixPath } from '@causeway/shared';
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { ok } from '@/testing/mock-api';
import { makeShop, makeUser } from '@/testing/test-data';
import { renderApp, waitForPageLoaded } from '@/testing/test-utils';
import { makeCodeEntryForFixPath } from './catalogue-entry-data';
import { CAUSE_ROWS, INPUT_AT_50, makeFixPath, makeRanking } from './fix-path-test-data';

function gbp(minor: number): string {
  return formatMoney(Math.round(minor), 'GBP', 'en-GB');
}

async function openCodePage(url = '/codes/P0456?make=Halden&model=Tarn') {
  const dto = makeFixPath();
  const app = await renderApp(url, {
    user: makeUser({ shop: makeShop({ labourRateMinor: 9_500 }) }),
    api: {
      'GET /api/codes/P0456': ok(makeCodeEntryForFixPath()),
      'GET /api/causes': ok(CAUSE_ROWS),
      'GET /api/codes/P0456/fix-path': ok(dto),
      'GET /api/codes/P0456/causes': ok(makeRanking()),
    },
  });
  return { app, dto };
}

describe('Fix path', () => {
  it('draws one stone a stage with its cost and chances, the baselines beside it, and what the order saves', async () => {
    const { app, dto } = await openCodePage();

    const stones = await screen.findByRole('list', { name: 'Stages of the fix path' });
    const stages = within(stones).getAllByRole('listitem');
    expect(stages).toHaveLength(dto.plan.stages.length);
    dto.plan.stages.forEach((stage, i) => {
      expect(stages[i]).toHaveTextContent(`Stage ${i + 1}`);
      expect(stages[i]).toHaveTextContent(gbp(stage.cost));
    });
    expect(screen.getByRole('list', { name: 'Stages of cheapest part first' })).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Stages of most likely first' })).toBeInTheDocument();
    expect(screen.getByTestId('expected-cost')).toHaveTextContent(gbp(dto.plan.expectedCost));
    expect(screen.getByTestId('fix-path-saving')).toHaveTextContent(gbp(dto.plan.savingVsCheapestFirst));

    // The vehicle from the address went to the server.
    const query = Object.fromEntries(app.server.calls('GET /api/codes/P0456/fix-path')[0].query);
    expect(query).toEqual({ make: 'Halden', model: 'Tarn' });

    // Ranked causes: whole percentages, the interval in the accessible name.
    const causes = screen.getByRole('region', { name: 'Possible causes' });
    expect(within(causes).getByLabelText('45% (90 % interval 23% to 72%)')).toBeInTheDocument();
    expect(within(causes).getByRole('cell', { name: /Canister vent valve/ })).toBeInTheDocument();
    // Safety for each stage's system, with the closing sentence.
    expect(screen.getByRole('note', { name: 'Safety: Fuel and fuel vapour' })).toHaveTextContent("Follow the vehicle maker's procedure");
  });

  it('plans again in the browser when the labour rate is edited, and resets', async () => {
    const { app, dto } = await openCodePage();
    const rate = await screen.findByRole('spinbutton', { name: 'Labour rate per hour, before tax (GBP)' });
    expect(rate).toHaveValue('95.00');

    await app.user.clear(rate);
    await app.user.type(rate, '50');

    const expected = planFixPath(INPUT_AT_50);
    expect(expected.expectedCost).not.toBeCloseTo(dto.plan.expectedCost);
    await waitFor(() => expect(screen.getByTestId('expected-cost')).toHaveTextContent(gbp(expected.expectedCost)));
    expect(screen.getByText('With your figures')).toBeInTheDocument();
    expect(screen.getByTestId('fix-path-saving')).toHaveTextContent(gbp(expected.savingVsCheapestFirst));
    // No server call was made to plan it.
    expect(app.server.calls('GET /api/codes/P0456/fix-path')).toHaveLength(1);

    await app.user.click(screen.getByRole('button', { name: /Reset to the shop's figures/ }));
    await waitFor(() => expect(screen.getByTestId('expected-cost')).toHaveTextContent(gbp(dto.plan.expectedCost)));
  });

  it('plans again when a part price is edited', async () => {
    const { app, dto } = await openCodePage();
    const price = await screen.findByRole('spinbutton', { name: 'Part price of Fuel filler cap (GBP)' });

    await app.user.clear(price);
    await app.user.type(price, '150');

    const edited = { ...dto.input, causes: dto.input.causes.map((c) => (c.key === 'fuel-cap' ? { ...c, replaceCost: 15_000 + 950 } : c)) };
    await waitFor(() => expect(screen.getByTestId('expected-cost')).toHaveTextContent(gbp(planFixPath(edited).expectedCost)));
  });

  it('keeps the vehicle in the address and asks again for the new one', async () => {
    const { app } = await openCodePage('/codes/P0456');
    await waitForPageLoaded();

    await app.user.click(screen.getByRole('combobox', { name: 'Make' }));
    await app.user.click(await screen.findByTitle('Morrow'));

    await waitFor(() => expect(app.router.state.location.search).toBe('?make=Morrow'));
    await waitFor(() => expect(app.server.calls('GET /api/codes/P0456/fix-path').at(-1)!.url).toBe('/api/codes/P0456/fix-path?make=Morrow'));
  });
});
