import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeShop, makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';

describe('Home', () => {
  it("shows the shop's labour rate before and with tax, in the shop's currency and locale", async () => {
    await renderApp('/', { user: makeUser({ shop: makeShop({ currency: 'EUR', locale: 'de-DE', labourRateMinor: 9_550, taxRateBp: 1_900 }) }) });

    expect(await screen.findByRole('heading', { name: 'Welcome, Robin Tester' })).toBeInTheDocument();
    // 95.50 + round(95.50 × 19 %) = 95.50 + 18.15 (18.145 rounded half up) = 113.65
    expect(screen.getByTestId('labour-net')).toHaveTextContent(/^95,50\s€$/);
    expect(screen.getByTestId('labour-gross')).toHaveTextContent(/^113,65\s€$/);
    expect(screen.getByText(/Per hour with 19\s%\stax/)).toBeInTheDocument();
  });

  it('looks a code up from the code box on Enter', async () => {
    const app = await renderApp('/', { user: makeUser() });

    await app.user.type(await screen.findByRole('searchbox', { name: 'Look up a fault code' }), ' P0456 {Enter}');

    // The code page: this test's server does not know the code, so the page decodes it itself.
    expect(await screen.findByRole('heading', { level: 1, name: 'P0456' })).toBeInTheDocument();
    expect(app.router.state.location.pathname).toBe('/codes/P0456');
  });
});
