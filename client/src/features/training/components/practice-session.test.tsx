import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ScriptedEngine } from '@/lib/speech';
import { makeVehicle } from '@/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { PracticeSession } from './practice-session';

const attempt = { id: 'att-1', status: 'recording', coverage: null };
const finished = {
  ...attempt,
  status: 'finished',
  coverage: { itemCount: 40, named: 3, partly: 1, missed: 36, namedFraction: 0.075, creditFraction: 0.0875 },
};

describe('practice session', () => {
  it('starts an attempt, sends what was heard by number, and finishes with the server’s count', async () => {
    const { calls } = mockApi({
      'POST /training/attempts': { status: 201, body: attempt },
      'PUT /training/attempts/att-1/segments': (call) => ({
        body: { segmentCount: (call.body as { segments: unknown[] }).segments.length },
      }),
      'POST /training/attempts/att-1/finish': { body: finished },
    });
    const engine = new ScriptedEngine(['Checking the left steer tire.', 'Oil level is good']);
    renderWithProviders(
      <PracticeSession
        units={[makeVehicle({ id: 'veh-1', unitNumber: 'KV-7' })]}
        locale="en"
        createEngine={() => engine}
      />,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Start' }));
    // jsdom cannot record: the narration is still noted, and the student is told.
    expect(await screen.findByText(/cannot record here/)).toBeInTheDocument();
    expect(await screen.findByText('oil level is good')).toBeInTheDocument();
    expect(screen.getByText('checking the left steer tire')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Stop and send' }));
    expect(await screen.findByText(/You named 3 of 40 items \(8 %\)/)).toBeInTheDocument();

    const create = calls.find((c) => c.method === 'POST' && c.path === '/training/attempts');
    expect(create?.body).toMatchObject({ vehicleIds: ['veh-1'], locale: 'en' });
    const sent = calls
      .filter((c) => c.method === 'PUT')
      .flatMap((c) => (c.body as { segments: { seq: number; text: string }[] }).segments);
    expect(sent.map((s) => [s.seq, s.text])).toEqual([
      [0, 'checking the left steer tire'],
      [1, 'oil level is good'],
    ]);
    await waitFor(() => expect(calls.some((c) => c.path === '/training/attempts/att-1/finish')).toBe(true));
    expect(calls.some((c) => c.path.endsWith('/audio'))).toBe(false);
  });

  it('shows the server’s sentence when the attempt cannot start', async () => {
    mockApi({
      'POST /training/attempts': {
        status: 403,
        body: { statusCode: 403, error: 'Forbidden', message: 'Only drivers marked as students do practice attempts.' },
      },
    });
    renderWithProviders(
      <PracticeSession units={[makeVehicle()]} locale="en" createEngine={() => new ScriptedEngine([])} />,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Start' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Only drivers marked as students');
    expect(screen.getByRole('button', { name: 'Start' })).toBeEnabled();
  });
});
