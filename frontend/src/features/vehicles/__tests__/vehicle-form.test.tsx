import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { jsonResponse, mockApi } from '@/testing/mock-api';
import { makeVehicle } from '@/testing/job-data';
import { renderWithProviders } from '@/testing/test-utils';
import { VehicleForm } from '../components/vehicle-form';

describe('Vehicle form', () => {
  // domain-reference §5 (49 CFR 565.15 worked example): 1HGCM82633A004352 is valid; with a 4 in position 9 it is not.
  it('shows the check-digit error position for a North-American VIN with a wrong check digit', async () => {
    mockApi({});
    const { user } = renderWithProviders(<VehicleForm distanceUnit="mi" locale="en-GB" />);

    const vin = screen.getByLabelText(/^VIN/);
    await user.type(vin, '1HGCM82643A004352');

    const check = await screen.findByTestId('vin-check');
    expect(await within(check).findByText(/Position 9: check digit is '4' but the other characters give '3'/)).toBeInTheDocument();
    expect(within(check).getByText(/North-American \(or Chinese\) VIN: the check digit must match/)).toBeInTheDocument();
    expect(await screen.findByText('This VIN cannot be saved: see the check below')).toBeInTheDocument();

    await user.clear(vin);
    await user.type(vin, '1HGCM82633A004352');
    expect(await screen.findByText("Check digit (position 9): '3' matches the other characters.")).toBeInTheDocument();
    expect(screen.getByText("Model year from position 10 ('3'): 2003.")).toBeInTheDocument();
    await waitFor(() => expect(screen.queryByText('This VIN cannot be saved: see the check below')).not.toBeInTheDocument());
  });

  it('asks before keeping an odometer reading lower than the last one, then sends the confirmation', async () => {
    const server = mockApi({
      'PATCH /api/vehicles/7a9e2b10-2c44-4e1f-8d3a-6b5c4d3e2f10': (request) => {
        const body = request.body as { confirmOdometerLower?: boolean; odometer?: number };
        if (!body.confirmOdometerLower) {
          return jsonResponse(409, {
            statusCode: 409,
            error: 'Conflict',
            message: 'odometer: 40000 mi is lower than the last reading of 52319 mi.',
            errors: [{ field: 'odometer', message: 'is lower than the last reading (52319 mi); confirm to keep it' }],
            details: { reason: 'odometer-lower', field: 'odometer', lastReading: 52_319, lastReadingKm: 84_200, given: 40_000, unit: 'mi', confirmWith: { confirmOdometerLower: true } },
          });
        }
        return jsonResponse(200, makeVehicle({ odometer: 40_000 }));
      },
    });
    const { user } = renderWithProviders(<VehicleForm vehicle={makeVehicle()} distanceUnit="mi" locale="en-GB" />);

    const odometer = screen.getByLabelText(/^Odometer \(miles\)/);
    await user.clear(odometer);
    await user.type(odometer, '40000');
    await user.click(screen.getByRole('button', { name: 'Save vehicle' }));

    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText(/40,000 mi is lower than the last reading of 52,319 mi/)).toBeInTheDocument();
    await user.click(within(dialog).getByRole('button', { name: 'Keep the lower reading' }));

    await waitFor(() => expect(server.calls('PATCH /api/vehicles/7a9e2b10-2c44-4e1f-8d3a-6b5c4d3e2f10')).toHaveLength(2));
    const [first, second] = server.calls('PATCH /api/vehicles/7a9e2b10-2c44-4e1f-8d3a-6b5c4d3e2f10');
    expect(first.body).toMatchObject({ odometer: 40_000 });
    expect(first.body).not.toHaveProperty('confirmOdometerLower');
    expect(second.body).toMatchObject({ odometer: 40_000, confirmOdometerLower: true });
    expect(await screen.findByText('Vehicle saved')).toBeInTheDocument();
  });

  it("puts the server's VIN error on the VIN field as it is worded", async () => {
    mockApi({
      'POST /api/vehicles': () =>
        jsonResponse(409, { statusCode: 409, error: 'Conflict', message: 'vin: a vehicle of this shop already has this VIN', errors: [{ field: 'vin', message: 'is already registered to a vehicle of this shop' }] }),
    });
    const { user } = renderWithProviders(<VehicleForm distanceUnit="km" locale="en-GB" />);
    await user.type(screen.getByLabelText(/^VIN/), '1HGCM82633A004352');
    await user.type(screen.getByLabelText('Make'), 'Halden');
    await user.type(screen.getByLabelText('Model'), 'Tarn');
    await user.click(screen.getByRole('button', { name: 'Add vehicle' }));
    expect(await screen.findByText('Is already registered to a vehicle of this shop')).toBeInTheDocument();
  });
});
