import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { fail, ok } from '@/testing/mock-api';
import { makeUser } from '@/testing/test-data';
import { renderApp } from '@/testing/test-utils';
import { makeCodeEntry, structureOf } from './codes-test-data';

const noVehicles = { 'GET /api/causes': ok([]) };

describe('Code page', () => {
  it('shows a valid code the catalogue does not hold with its decoded structure', async () => {
    await renderApp('/codes/P3456', {
      user: makeUser(),
      api: {
        ...noVehicles,
        'GET /api/codes/P3456': fail(404, {
          message: 'P3456 is a valid code but is not in the catalogue',
          details: { structure: structureOf('P3456') },
        }),
      },
    });

    expect(await screen.findByRole('heading', { level: 2, name: 'P3456 is a valid code, but not in the catalogue' })).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 1, name: 'P3456' })).toBeInTheDocument();
    expect(screen.getByText('Powertrain (P)')).toBeInTheDocument();
    expect(screen.getByText('Powertrain (standard range P3400–P3FFF)')).toBeInTheDocument();
    expect(screen.getByText('34 56')).toBeInTheDocument();
  });

  it('explains why something is not a code, naming the position', async () => {
    await renderApp('/codes/X0123', {
      user: makeUser(),
      api: {
        'GET /api/codes/X0123': fail(400, {
          message: "code: Position 1: expected P, C, B or U (or hex bytes such as 04 56), got 'X'",
          details: { input: 'X0123', position: 1, message: "Position 1: expected P, C, B or U (or hex bytes such as 04 56), got 'X'" },
        }),
      },
    });

    expect(await screen.findByRole('heading', { level: 1, name: 'Not a fault code' })).toBeInTheDocument();
    expect(screen.getByTestId('code-invalid-reason')).toHaveTextContent("Position 1: expected P, C, B or U (or hex bytes such as 04 56), got 'X'");
  });

  it('shows the meaning, structure, symptoms, verification and cautions of a catalogue entry', async () => {
    await renderApp('/codes/P0456', {
      user: makeUser(),
      api: {
        ...noVehicles,
        'GET /api/codes/P0456': ok(makeCodeEntry()),
        'GET /api/codes/P0456/fix-path': fail(500, { message: 'Not in this test' }),
        'GET /api/codes/P0456/causes': fail(500, { message: 'Not in this test' }),
      },
    });

    expect(await screen.findByRole('heading', { level: 1, name: 'P0456 · Evaporative Emission System Leak Detected (very small leak)' })).toBeInTheDocument();
    expect(screen.getByText(/losing pressure slightly faster/)).toBeInTheDocument();
    expect(screen.getByText('Engine warning lamp on')).toBeInTheDocument();
    expect(screen.getByText('EVAP monitor')).toBeInTheDocument();
    const caution = screen.getByRole('note', { name: 'Safety: Fuel and fuel vapour' });
    expect(caution).toHaveTextContent('Keep every ignition source away.');
    expect(caution).toHaveTextContent("Follow the vehicle maker's procedure, local regulations and licensed practice.");
    // The catalogue's own copy of that sentence is not repeated.
    expect(caution).not.toHaveTextContent('they govern this work');
  });
});
