import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { validateVehicle, type VehicleRequest } from '@yardcall/shared';
import { ApiError } from '@/lib/api-client';
import { renderWithProviders } from '@/testing/render';
import { draftToRequest, newVehicleDraft, type VehicleDraft } from './vehicle-draft';
import { VehicleForm } from './vehicle-form';

function completeTractor(): VehicleDraft {
  const draft = newVehicleDraft('tractor');
  return {
    ...draft,
    unitNumber: 'T-412',
    vin: '1BCDE23F4GH567890',
    plate: 'BHX 4412',
    steeringWheelDiameterIn: '20',
    axles: draft.axles.map((axle) => ({
      ...axle,
      chamberSize: 30,
      tireSize: '11R22.5',
      coldInflationPsi: '105',
      sidewallMaxPsi: '120',
    })),
  };
}

function renderForm(initial: VehicleDraft, serverError: unknown = null) {
  const onSubmit = vi.fn<(request: VehicleRequest) => void>();
  renderWithProviders(
    <VehicleForm
      initial={initial}
      submitLabel="Save vehicle"
      busy={false}
      serverError={serverError}
      onSubmit={onSubmit}
    />,
  );
  return { onSubmit };
}

describe('VehicleForm', () => {
  it("shows the shared rule's message beside the field it concerns", async () => {
    const draft = completeTractor();
    const bad = {
      ...draft,
      axles: draft.axles.map((axle, index) => (index === 1 ? { ...axle, coldInflationPsi: '130' } : axle)),
    };
    // The message comes from the shared rules, not from a copy in the client.
    const expected = validateVehicle(draftToRequest(bad)).find(
      (problem) => problem.field === 'config.axles.1.tire.coldInflationPsi',
    );
    expect(expected).toBeDefined();
    const { onSubmit } = renderForm(bad);

    await userEvent.click(screen.getByRole('button', { name: 'Save vehicle' }));

    const axle = screen.getByTestId('axle-1');
    const field = within(axle).getByLabelText('Cold-inflation spec (psi)');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription(expect.stringContaining(expected?.message ?? '?'));
    expect(field).toHaveFocus();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('tells a missing chamber type at the chamber type field', async () => {
    const draft = completeTractor();
    renderForm({
      ...draft,
      axles: draft.axles.map((axle, index) => (index === 0 ? { ...axle, chamberSize: null } : axle)),
    });
    await userEvent.click(screen.getByRole('button', { name: 'Save vehicle' }));
    expect(within(screen.getByTestId('axle-0')).getByLabelText('Chamber type')).toHaveAccessibleDescription(
      'An air brake needs its chamber type (9 to 36) and stroke.',
    );
  });

  it('hides the chamber fields for a hydraulic brake and sends no chamber', async () => {
    const { onSubmit } = renderForm(completeTractor());
    const axle = within(screen.getByTestId('axle-0'));
    expect(axle.getByLabelText('Chamber type')).toBeInTheDocument();

    await userEvent.selectOptions(axle.getByLabelText('Brake'), 'hydraulic');

    expect(axle.queryByLabelText('Chamber type')).not.toBeInTheDocument();
    expect(axle.queryByLabelText('Chamber stroke')).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Save vehicle' }));
    expect(onSubmit).toHaveBeenCalledTimes(1);
    const request = onSubmit.mock.calls[0]?.[0];
    expect(request?.config.axles[0]?.brake).toBe('hydraulic');
    expect(request?.config.axles[0]).not.toHaveProperty('chamber');
    expect(request?.config.axles[1]?.chamber).toEqual({ size: 30, stroke: 'standard' });
  });

  it('offers the 3 in rated stroke only for long-stroke type 20 and 24 chambers', async () => {
    renderForm(completeTractor());
    const axle = within(screen.getByTestId('axle-1'));
    expect(axle.queryByLabelText(/3 in rated stroke/)).not.toBeInTheDocument();
    await userEvent.selectOptions(axle.getByLabelText('Chamber type'), '24');
    await userEvent.selectOptions(axle.getByLabelText('Chamber stroke'), 'long');
    expect(axle.getByLabelText(/3 in rated stroke/)).toBeInTheDocument();
  });

  it('drops the steering fields and uses trailer axles for a trailer', async () => {
    renderForm(completeTractor());
    expect(screen.getByLabelText('Steering wheel diameter (in)')).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'trailer');
    expect(screen.queryByLabelText('Steering wheel diameter (in)')).not.toBeInTheDocument();
    expect(within(screen.getByTestId('axle-0')).getByLabelText('Position')).toHaveValue('trailer');
  });

  it("shows the server's field problems beside their fields", () => {
    renderForm(
      completeTractor(),
      new ApiError(409, 'A vehicle with unit number T-412 already exists.', 'Conflict', [
        { field: 'unitNumber', message: 'Unit number T-412 is taken.' },
      ]),
    );
    expect(screen.getByRole('alert')).toHaveTextContent('A vehicle with unit number T-412 already exists.');
    expect(screen.getByLabelText('Unit number')).toHaveAccessibleDescription('Unit number T-412 is taken.');
  });

  it('submits a complete tractor unchanged by the shared rules', async () => {
    const { onSubmit } = renderForm(completeTractor());
    await userEvent.click(screen.getByRole('button', { name: 'Save vehicle' }));
    const request = onSubmit.mock.calls[0]?.[0];
    expect(request && validateVehicle(request)).toEqual([]);
    expect(request?.config.steering).toEqual({ wheelDiameterIn: 20, type: 'power' });
  });
});
