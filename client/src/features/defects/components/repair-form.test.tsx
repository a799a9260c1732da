import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { DefectResponse, RepairRequest } from '@yardcall/shared';
import { errorBody, mockApi, type MockReply } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { checkRepairDraft, EMPTY_REPAIR_DRAFT, localDateString } from './repair-draft';
import { RepairForm } from './repair-form';

function makeDefect(patch: Partial<DefectResponse> = {}): DefectResponse {
  return {
    id: 'def-1',
    inspectionId: 'insp-1',
    vehicle: { id: 'veh-1', unitNumber: 'KV-101', kind: 'tractor' },
    itemKey: 'u1.axle1.left.tire.tread',
    title: 'Tread depth',
    positionLabel: 'steer axle, left',
    safety: true,
    detail: 'worn down to the wear bars',
    measurement: { quantity: 'tread_depth', value: 2, unit: 'in/32' },
    limit: { value: 4, unit: 'in/32', source: '49 CFR 393.75(b)' },
    status: 'open',
    createdAt: '2026-12-01T06:00:00.000Z',
    repair: null,
    ...patch,
  };
}

// jsdom has no canvas: a context that accepts strokes and a fixed PNG.
beforeEach(() => {
  const context = { beginPath() {}, moveTo() {}, lineTo() {}, stroke() {}, clearRect() {} } as object;
  vi.spyOn(HTMLCanvasElement.prototype, 'getContext').mockReturnValue(context as CanvasRenderingContext2D);
  vi.spyOn(HTMLCanvasElement.prototype, 'toDataURL').mockReturnValue('data:image/png;base64,c2lnbmVk');
});

afterEach(() => {
  vi.restoreAllMocks();
  vi.unstubAllGlobals();
});

function drawSignature() {
  const pad = screen.getByTestId('signature-pad');
  fireEvent.pointerDown(pad, { clientX: 5, clientY: 5, pointerId: 1 });
  fireEvent.pointerMove(pad, { clientX: 50, clientY: 20, pointerId: 1 });
  fireEvent.pointerUp(pad, { clientX: 50, clientY: 20, pointerId: 1 });
}

function renderRepairForm(
  defect: DefectResponse,
  reply: MockReply = { status: 201, body: { ...defect, status: 'repaired' } },
) {
  const api = mockApi({ [`POST /defects/${defect.id}/repair`]: reply });
  const onCertified = vi.fn();
  renderWithProviders(<RepairForm defect={defect} onCertified={onCertified} onCancel={() => {}} />);
  return { ...api, onCertified };
}

const tomorrow = () => localDateString(new Date(Date.now() + 24 * 3_600_000));

describe('RepairForm', () => {
  it('does not offer deferral for a safety defect and says why', () => {
    renderRepairForm(makeDefect({ safety: true }));
    expect(screen.getByRole('radio', { name: 'Repaired' })).toBeInTheDocument();
    expect(screen.getByRole('radio', { name: 'No repair needed' })).toBeInTheDocument();
    expect(screen.queryByRole('radio', { name: 'Deferred' })).not.toBeInTheDocument();
    expect(screen.getByText(/Deferral is not offered: this defect affects safe operation/)).toHaveTextContent(
      '49 CFR 396.11(a)(3)',
    );
  });

  it('refuses a deferral of a safety defect even when asked directly', () => {
    const draft = { ...EMPTY_REPAIR_DRAFT, action: 'deferred' as const, note: 'waits', deferredUntil: tomorrow() };
    expect(checkRepairDraft(draft, { safety: true, today: new Date() }).action).toBe('deferSafety');
    expect(checkRepairDraft(draft, { safety: false, today: new Date() }).action).toBeUndefined();
  });

  it('asks for the date a deferral lasts until, and for a future one', async () => {
    const { calls } = renderRepairForm(makeDefect({ safety: false, title: 'Marker lamp' }));
    await userEvent.click(screen.getByRole('radio', { name: 'Deferred' }));
    await userEvent.type(screen.getByLabelText('Why the repair can wait'), 'Lamp on order; the others work.');
    await userEvent.type(screen.getByLabelText('Your full name'), 'Rui Almeida');
    drawSignature();

    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    expect(screen.getByText('Give the date the repair is deferred until.')).toBeInTheDocument();

    fireEvent.change(screen.getByLabelText('Deferred until'), { target: { value: localDateString(new Date()) } });
    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    expect(screen.getByText('Choose a date after today.')).toBeInTheDocument();
    expect(calls.filter((call) => call.method === 'POST')).toHaveLength(0);

    fireEvent.change(screen.getByLabelText('Deferred until'), { target: { value: tomorrow() } });
    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    await waitFor(() => expect(calls.filter((call) => call.method === 'POST')).toHaveLength(1));
    const body = calls.find((call) => call.method === 'POST')?.body as RepairRequest;
    expect(body.action).toBe('deferred');
    expect(localDateString(new Date(body.deferredUntil ?? ''))).toBe(tomorrow());
  });

  it('needs a drawn signature as well as the typed name before it certifies', async () => {
    const { calls, onCertified } = renderRepairForm(makeDefect());
    await userEvent.click(screen.getByRole('radio', { name: 'Repaired' }));
    await userEvent.type(screen.getByLabelText('What was done'), 'Replaced the left steer tire.');
    await userEvent.type(screen.getByLabelText('Your full name'), 'Rui Almeida');

    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    expect(screen.getByText('Draw your signature in the box to certify.')).toBeInTheDocument();
    expect(screen.getByTestId('signature-pad')).toHaveAccessibleDescription(
      /Draw your signature in the box to certify\./,
    );
    expect(calls).toHaveLength(0);

    drawSignature();
    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    await waitFor(() => expect(onCertified).toHaveBeenCalled());
    expect(calls[0]?.body).toEqual({
      action: 'repaired',
      note: 'Replaced the left steer tire.',
      signature: { name: 'Rui Almeida', drawing: 'data:image/png;base64,c2lnbmVk' },
    });
  });

  it('asks for an action, a note and a name before anything is sent', async () => {
    const { calls } = renderRepairForm(makeDefect());
    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    expect(screen.getByText(/Choose what you did/)).toBeInTheDocument();
    expect(screen.getByText('Write a note: what was done, or why.')).toBeInTheDocument();
    expect(screen.getByText('Type your full name to sign.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it("shows the server's sentence when it refuses the certification", async () => {
    renderRepairForm(makeDefect(), {
      status: 409,
      body: errorBody(409, 'This defect is already certified (repaired): a certification is final.'),
    });
    await userEvent.click(screen.getByRole('radio', { name: 'No repair needed' }));
    await userEvent.type(screen.getByLabelText('Why no repair is needed'), 'Within limits on re-measure.');
    await userEvent.type(screen.getByLabelText('Your full name'), 'Rui Almeida');
    drawSignature();
    await userEvent.click(screen.getByRole('button', { name: 'Sign and certify' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('a certification is final');
  });
});
