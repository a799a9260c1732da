import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { PendingAcknowledgement } from '@yardcall/shared';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { PendingAcknowledgementReview } from './pending-acknowledgement-review';

const PENDING: PendingAcknowledgement = {
  inspectionId: 'insp-7',
  vehicle: { id: 'veh-2', unitNumber: 'KV-102', kind: 'tractor' },
  submittedAt: '2026-12-01T05:40:00.000Z',
  driver: { id: 'user-tr', name: 'Tomas Reyes' },
  defects: [
    {
      id: 'def-1',
      inspectionId: 'insp-7',
      vehicle: { id: 'veh-2', unitNumber: 'KV-102', kind: 'tractor' },
      itemKey: 'u1.axle1.left.tire.tread',
      title: 'Tread depth',
      positionLabel: 'Tractor, axle 1, left tire',
      safety: true,
      detail: 'worn to the wear bars',
      measurement: { quantity: 'tread_depth', value: 2, unit: 'in/32' },
      limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
      status: 'repaired',
      createdAt: '2026-12-01T05:52:00.000Z',
      repair: {
        action: 'repaired',
        note: 'Replaced the left steer tire.',
        deferredUntil: null,
        mechanic: { id: 'user-m', name: 'Rui Almeida' },
        signedAt: '2026-12-01T09:15:00.000Z',
      },
    },
  ],
};

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('PendingAcknowledgementReview', () => {
  it("says what was repaired: each defect, the mechanic's action, note and name", () => {
    mockApi({});
    renderWithProviders(<PendingAcknowledgementReview pending={PENDING} onSigned={() => {}} />);
    expect(screen.getByTestId('ack-blocked')).toHaveTextContent('The pre-trip of unit KV-102 starts only after');
    const defect = screen.getByTestId('acknowledged-defect');
    expect(defect).toHaveTextContent('Tread depth — Tractor, axle 1, left tire');
    expect(defect).toHaveTextContent('Tomas Reyes said: “worn to the wear bars”');
    expect(screen.getByTestId('ack-action')).toHaveTextContent('Repaired');
    expect(defect).toHaveTextContent('“Replaced the left steer tire.”');
    expect(defect).toHaveTextContent('Rui Almeida');
    expect(screen.getByTestId('safety-caution')).toBeInTheDocument();
  });

  it('goes on only once the review is signed with a typed name', async () => {
    const { calls } = mockApi({ 'POST /inspections/insp-7/acknowledge': { status: 201, body: {} } });
    const onSigned = vi.fn();
    renderWithProviders(<PendingAcknowledgementReview pending={PENDING} onSigned={onSigned} />);

    await userEvent.click(screen.getByRole('button', { name: 'Sign the review and continue' }));
    expect(screen.getByText('Type your full name to sign.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
    expect(onSigned).not.toHaveBeenCalled();

    await userEvent.type(screen.getByLabelText('Your full name'), 'Dana Okafor');
    await userEvent.click(screen.getByRole('button', { name: 'Sign the review and continue' }));
    await waitFor(() => expect(onSigned).toHaveBeenCalled());
    expect(calls[0]?.body).toEqual({ signature: { name: 'Dana Okafor' } });
  });
});
