import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { RetentionPurgeResult, RetentionSettings } from '@yardcall/shared';
import { mockApi, type RecordedCall } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { RetentionRoute } from '../routes/retention';
import { retentionMonthsProblem } from './retention-form';

const SETTINGS: RetentionSettings = { months: 12, minimumMonths: 3, cutoff: '2025-12-02T00:00:00.000Z' };

const PURGED: RetentionPurgeResult = {
  cutoff: SETTINGS.cutoff,
  removed: {
    inspections: 4,
    itemResults: 412,
    voiceNotes: 3,
    photos: 1,
    defects: 2,
    repairs: 2,
    signatures: 7,
    storedObjects: 4,
  },
  keptWithOpenDefects: 1,
};

afterEach(() => {
  vi.unstubAllGlobals();
});

function renderRetention() {
  return mockApi({
    'GET /organizations/retention': { body: SETTINGS },
    'PATCH /organizations/retention': (call: RecordedCall) => ({
      body: { ...SETTINGS, months: (call.body as { months: number }).months },
    }),
    'POST /organizations/retention/purge': { status: 201, body: PURGED },
  });
}

describe('Record retention', () => {
  it('refuses fewer months than the minimum and names the rule', async () => {
    const { calls } = renderRetention();
    renderWithProviders(<RetentionRoute />);
    const field = await screen.findByLabelText('Keep reports for (months)');
    expect(field).toHaveValue('12');

    await userEvent.clear(field);
    await userEvent.type(field, '2');
    await userEvent.click(screen.getByRole('button', { name: 'Save the retention' }));

    expect(screen.getByText(/Keep reports at least 3 months/)).toHaveTextContent('49 CFR 396.11(a)(4)');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(calls.some((call) => call.method === 'PATCH')).toBe(false);
  });

  it('saves a whole number of months at or above the minimum', async () => {
    const { calls } = renderRetention();
    renderWithProviders(<RetentionRoute />);
    const field = await screen.findByLabelText('Keep reports for (months)');
    await userEvent.clear(field);
    await userEvent.type(field, '3');
    await userEvent.click(screen.getByRole('button', { name: 'Save the retention' }));

    expect(await screen.findByTestId('retention-saved')).toHaveTextContent('Saved: reports are kept 3 months.');
    expect(calls.find((call) => call.method === 'PATCH')?.body).toEqual({ months: 3 });
  });

  it('takes a whole number of months from three to 120', () => {
    // 49 CFR 396.11(a)(4): three months at least; ten years at most is our own bound.
    expect(retentionMonthsProblem('2')).toBe('monthsTooFew');
    expect(retentionMonthsProblem('3')).toBeNull();
    expect(retentionMonthsProblem('120')).toBeNull();
    expect(retentionMonthsProblem('121')).toBe('monthsTooMany');
    expect(retentionMonthsProblem('4.5')).toBe('monthsWhole');
    expect(retentionMonthsProblem('')).toBe('monthsWhole');
  });

  it('asks before purging, then shows what was removed', async () => {
    const { calls } = renderRetention();
    renderWithProviders(<RetentionRoute />);
    await userEvent.click(await screen.findByRole('button', { name: 'Purge now' }));

    expect(await screen.findByText('Remove old records now?')).toBeInTheDocument();
    expect(calls.some((call) => call.method === 'POST')).toBe(false);
    await userEvent.click(screen.getByRole('button', { name: 'Remove them now' }));

    expect(await screen.findByText('Old records removed')).toBeInTheDocument();
    await waitFor(() => expect(screen.getByTestId('purge-count-inspections')).toHaveTextContent('4'));
    expect(screen.getByTestId('purge-count-itemResults')).toHaveTextContent('412');
    expect(screen.getByText(/1 old report kept because a defect of it is still open or deferred/)).toBeInTheDocument();
  });

  it('purges nothing when the admin cancels', async () => {
    const { calls } = renderRetention();
    renderWithProviders(<RetentionRoute />);
    await userEvent.click(await screen.findByRole('button', { name: 'Purge now' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByText('Remove old records now?')).not.toBeInTheDocument());
    expect(calls.some((call) => call.method === 'POST')).toBe(false);
  });
});
