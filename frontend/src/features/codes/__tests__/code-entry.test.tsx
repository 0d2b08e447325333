import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { makeUser } from '@/testing/test-data';
import { renderApp, renderWithProviders } from '@/testing/test-utils';
import { CodeEntry } from '../components/code-entry';

describe('Code entry', () => {
  it('decodes as the user types and says which letter O it read as zero', async () => {
    const { user } = renderWithProviders(<CodeEntry label="Fault code" />);

    await user.type(screen.getByRole('searchbox', { name: 'Fault code' }), 'po456');

    const decoded = await screen.findByTestId('code-entry-decoded');
    expect(within(decoded).getByText('P0456')).toBeInTheDocument();
    expect(within(decoded).getByText(/Corrected: letter O read as digit 0 at position 2 \(po456 → P0456\)/)).toBeInTheDocument();
    expect(within(decoded).getByText('Powertrain (P)')).toBeInTheDocument();
    expect(within(decoded).getByText('SAE/ISO-defined (generic)')).toBeInTheDocument();
    expect(within(decoded).getByText('04 56')).toBeInTheDocument();
  });

  it('reads the bytes a scan tool shows, with the failure type', async () => {
    const { user } = renderWithProviders(<CodeEntry label="Fault code" />);

    await user.type(screen.getByRole('searchbox', { name: 'Fault code' }), '04 56 13');

    const decoded = await screen.findByTestId('code-entry-decoded');
    expect(within(decoded).getByText('P0456-13')).toBeInTheDocument();
    expect(within(decoded).getByText(/General electrical failure: Circuit open/)).toBeInTheDocument();
  });

  it('rejects X0123 naming position 1 and the rule, and marks the field invalid', async () => {
    const { user } = renderWithProviders(<CodeEntry label="Fault code" />);
    const field = screen.getByRole('searchbox', { name: 'Fault code' });

    await user.type(field, 'X0123');

    const rejected = await screen.findByTestId('code-entry-rejected');
    expect(rejected).toHaveTextContent("Not a fault code: Position 1: expected P, C, B or U (or hex bytes such as 04 56), got 'X'");
    expect(field).toHaveAttribute('aria-invalid', 'true');
    // The explanation is what the field is described by, and it is announced politely.
    const described = field.getAttribute('aria-describedby') ?? '';
    const live = document.getElementById(described.split(' ')[1]);
    expect(live).toHaveAttribute('aria-live', 'polite');
    expect(live).toContainElement(rejected);
  });

  it('asks calmly for more while a code is still being typed', async () => {
    const { user } = renderWithProviders(<CodeEntry label="Fault code" />);

    await user.type(screen.getByRole('searchbox', { name: 'Fault code' }), 'P04');

    expect(await screen.findByTestId('code-entry-rejected')).toHaveTextContent(/Keep typing: Position 4: too short/);
  });

  it('opens the code page on Enter, in normal form', async () => {
    const app = await renderApp('/codes', { user: makeUser(), api: {} });

    await app.user.type(screen.getByRole('searchbox', { name: 'Look up a fault code' }), 'po456{Enter}');

    await screen.findByRole('link', { name: /All fault codes/ });
    expect(app.router.state.location.pathname).toBe('/codes/P0456');
  });
});
