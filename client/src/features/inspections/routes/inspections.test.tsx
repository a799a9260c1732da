import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { InspectionListItem, InspectionPage } from '@yardcall/shared';
import { tokenStore } from '@/lib/api-client';
import { makeUser, makeVehicle } from '@/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { InspectionsRoute } from './inspections';

function row(id: string, patch: Partial<InspectionListItem> = {}): InspectionListItem {
  return {
    id,
    kind: 'pre_trip',
    status: 'submitted',
    startedAt: '2026-11-30T06:00:00.000Z',
    submittedAt: '2026-11-30T06:20:00.000Z',
    driver: { id: 'drv-1', name: 'Marisol Vance' },
    vehicles: [{ id: 'veh-1', unitNumber: 'KV-101', kind: 'tractor' }],
    defectCount: 0,
    rushed: false,
    recurringDefect: false,
    durationSeconds: 1200,
    ...patch,
  };
}

describe('InspectionsRoute', () => {
  it('sends a checked filter to the API and the address, and loads the next page by its cursor', async () => {
    tokenStore.set('token');
    const { calls } = mockApi({
      'GET /vehicles': { body: [makeVehicle({ id: 'veh-1', unitNumber: 'KV-101' })] },
      'GET /users': { body: [makeUser('driver', { id: 'drv-1', name: 'Marisol Vance' })] },
      'GET /inspections': (call) => {
        const search = new URLSearchParams(call.search);
        const page: InspectionPage = search.get('cursor')
          ? { items: [row('insp-3')], nextCursor: null }
          : search.get('hasDefects') === 'true'
            ? { items: [row('insp-2', { defectCount: 2, rushed: true })], nextCursor: 'next-1' }
            : { items: [row('insp-1')], nextCursor: null };
        return { body: page };
      },
    });
    const { router } = renderWithProviders(<InspectionsRoute />, { path: '/supervisor/inspections' });
    expect(await screen.findByText('1 inspection shown.')).toBeInTheDocument();

    await userEvent.click(screen.getByLabelText('With defects only'));
    expect(screen.getByLabelText('With defects only')).toBeChecked();
    expect(await screen.findByText('2 defects')).toBeInTheDocument();
    // Told in words as well as by the mark.
    expect(screen.getByTestId('flag-rushed')).toHaveTextContent('Rushed');
    expect(new URLSearchParams(router.state.location.search).get('hasDefects')).toBe('true');

    await userEvent.click(screen.getByRole('button', { name: 'Load more' }));
    await waitFor(() => expect(screen.getAllByTestId('inspection-row')).toHaveLength(2));
    const cursorCall = calls.find((call) => call.search.includes('cursor=next-1'));
    expect(new URLSearchParams(cursorCall?.search).get('hasDefects')).toBe('true');
    expect(screen.queryByRole('button', { name: 'Load more' })).not.toBeInTheDocument();
  });

  it('asks the server for the other order when a sortable heading is pressed', async () => {
    tokenStore.set('token');
    const { calls } = mockApi({
      'GET /vehicles': { body: [] },
      'GET /users': { body: [] },
      'GET /inspections': { body: { items: [row('insp-1')], nextCursor: null } },
    });
    const { router } = renderWithProviders(<InspectionsRoute />, { path: '/supervisor/inspections' });
    await screen.findByText('1 inspection shown.');
    expect(screen.getByRole('columnheader', { name: /Started/ })).toHaveAttribute('aria-sort', 'descending');

    await userEvent.click(screen.getByTestId('sort-startedAt'));
    await waitFor(() => expect(router.state.location.search).toContain('order=asc'));
    await waitFor(() =>
      expect(calls.some((call) => new URLSearchParams(call.search).get('order') === 'asc')).toBe(true),
    );
    expect(screen.getByRole('columnheader', { name: /Started/ })).toHaveAttribute('aria-sort', 'ascending');
  });
});
