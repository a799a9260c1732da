import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { OrganizationTimeZone } from '@yardcall/shared';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { TimeZoneRoute } from '../routes/time-zone';

afterEach(() => {
  vi.unstubAllGlobals();
});

function renderTimeZone() {
  return mockApi({
    'GET /organizations/time-zone': { body: { timeZone: 'UTC' } satisfies OrganizationTimeZone },
    'PATCH /organizations/time-zone': (call: RecordedCall) => ({ body: call.body }),
  });
}

describe('Organisation time zone', () => {
  it('shows the zone in use and saves a known name in its canonical spelling', async () => {
    const { calls } = renderTimeZone();
    renderWithProviders(<TimeZoneRoute />);
    const field = await screen.findByLabelText('Time zone name');
    expect(field).toHaveValue('UTC');
    expect(screen.getByTestId('time-zone-current')).toHaveTextContent(
      /^Now set to UTC: it is \d{4}-\d\d-\d\d \d\d:\d\d UTC there\.$/,
    );

    await userEvent.clear(field);
    await userEvent.type(field, 'america/chicago');
    await userEvent.click(screen.getByRole('button', { name: 'Save the time zone' }));

    expect(await screen.findByTestId('time-zone-saved')).toHaveTextContent('Saved: times now read in America/Chicago.');
    expect(calls.find((call) => call.method === 'PATCH')?.body).toEqual({ timeZone: 'America/Chicago' });
  });

  it('refuses a name that is not a time zone before asking the server', async () => {
    const { calls } = renderTimeZone();
    renderWithProviders(<TimeZoneRoute />);
    const field = await screen.findByLabelText('Time zone name');
    await userEvent.clear(field);
    await userEvent.type(field, 'Central Time');
    await userEvent.click(screen.getByRole('button', { name: 'Save the time zone' }));

    expect(screen.getByText(/"Central Time" is not a time zone name we know/)).toBeInTheDocument();
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(calls.some((call) => call.method === 'PATCH')).toBe(false);
  });
});
