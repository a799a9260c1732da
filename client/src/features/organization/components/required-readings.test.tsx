import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { READING_RULES, type OrganizationSummary } from '@yardcall/shared';
import { errorBody, mockApi, type RecordedCall } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { RequiredReadingsRoute } from '../routes/required-readings';

const ORGANIZATION: OrganizationSummary = {
  id: '5b0f8a52-4a8e-4d47-9c1f-3c1d2e7a9b10',
  name: 'Kestrel Valley Freight',
  requiredReadings: [],
};

afterEach(() => {
  vi.unstubAllGlobals();
});

function renderReadings(organization: OrganizationSummary = ORGANIZATION) {
  const api = mockApi({
    'GET /organizations/current': { body: organization },
    'PATCH /organizations/readings': (call: RecordedCall) => ({
      body: { ...organization, ...(call.body as Pick<OrganizationSummary, 'requiredReadings'>) },
    }),
  });
  renderWithProviders(<RequiredReadingsRoute />);
  return api;
}

describe('Required readings', () => {
  it('shows a checkbox in plain words for each reading, none checked by default, and says a driver may answer "no gauge"', async () => {
    renderReadings();
    const boxes = await screen.findAllByRole('checkbox');
    expect(boxes).toHaveLength(READING_RULES.length);
    for (const box of boxes) expect(box).not.toBeChecked();
    expect(screen.getByRole('checkbox', { name: 'Tread depth of the steer tires' })).toHaveAccessibleDescription(
      'A tread depth gauge reading on each steer-axle tire.',
    );
    expect(screen.getByRole('checkbox', { name: 'Pressure of every tire' })).toBeInTheDocument();
    expect(screen.getByText(/By default none is required/)).toBeInTheDocument();
    expect(screen.getByText(/may always answer "no gauge"/)).toBeInTheDocument();
    // No code names on the screen.
    expect(screen.getByTestId('readings-form')).not.toHaveTextContent('steer_tread_depth');
  });

  it('saves the readings checked, in the order the app lists them', async () => {
    const { calls } = renderReadings();
    await userEvent.click(await screen.findByRole('checkbox', { name: 'Pressure of every tire' }));
    await userEvent.click(screen.getByRole('checkbox', { name: 'Tread depth of the steer tires' }));
    await userEvent.click(screen.getByRole('button', { name: 'Save the required readings' }));

    expect(await screen.findByTestId('readings-saved')).toHaveTextContent(
      'Saved: 2 readings are required on every walk-around begun from now on.',
    );
    expect(calls.find((call) => call.method === 'PATCH')?.body).toEqual({
      requiredReadings: ['steer_tread_depth', 'tire_pressure'],
    });
  });

  it('starts from what the organisation requires and can clear it back to none', async () => {
    const { calls } = renderReadings({ ...ORGANIZATION, requiredReadings: ['lining_thickness'] });
    const lining = await screen.findByRole('checkbox', { name: 'Brake lining thickness' });
    expect(lining).toBeChecked();
    await userEvent.click(lining);
    await userEvent.click(screen.getByRole('button', { name: 'Save the required readings' }));

    expect(await screen.findByTestId('readings-saved')).toHaveTextContent('Saved: no reading is required.');
    expect(calls.find((call) => call.method === 'PATCH')?.body).toEqual({ requiredReadings: [] });
  });

  it("shows the server's words when it refuses the change", async () => {
    mockApi({
      'GET /organizations/current': { body: ORGANIZATION },
      'PATCH /organizations/readings': {
        status: 403,
        body: errorBody(403, 'Only an admin may do this; you are signed in as supervisor.'),
      },
    });
    renderWithProviders(<RequiredReadingsRoute />);
    await userEvent.click(await screen.findByRole('checkbox', { name: 'Air brake test readings' }));
    await userEvent.click(screen.getByRole('button', { name: 'Save the required readings' }));
    expect(await screen.findByText(/Only an admin may do this/)).toBeInTheDocument();
    expect(screen.queryByTestId('readings-saved')).not.toBeInTheDocument();
  });
});
