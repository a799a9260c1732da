import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  buildChecklist,
  scoreNarration,
  type PutTrainingReviewRequest,
  type TrainingAttemptResponse,
} from '@yardcall/shared';
import { sampleTractor } from '@yardcall/shared/testing';
import { mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { AttemptReview } from './attempt-review';

function makeAttempt(): TrainingAttemptResponse {
  // The front and the cab only: enough items to mark, few enough for jsdom.
  const full = buildChecklist([sampleTractor()], 'practice', 'en');
  const checklist = { ...full, items: full.items.filter((item) => ['front', 'cab'].includes(item.zone)) };
  const segments = [
    { text: 'engine oil level is good', startMs: 4000, endMs: 6000 },
    { text: 'checking the headlights and the windshield', startMs: 9000, endMs: 12000 },
  ];
  const score = scoreNarration(segments, checklist);
  return {
    id: 'att-1',
    clientId: 'c-1',
    kind: 'practice',
    status: 'finished',
    student: { id: 'stu-1', name: 'Jordan Pike' },
    vehicles: [{ id: 'veh-1', unitNumber: 'KV-101', kind: 'tractor' }],
    locale: 'en',
    startedAt: '2026-12-01T08:00:00.000Z',
    finishedAt: '2026-12-01T08:05:00.000Z',
    durationMs: 300_000,
    coverage: score.overall,
    grade: null,
    reviewedAt: null,
    checklist,
    segments,
    audio: { mimeType: 'audio/webm', sizeBytes: 10, durationMs: 300_000, sha256: 'x', audioUrl: '' },
    score,
    review: null,
  };
}

describe('attempt review', () => {
  beforeEach(() => {
    vi.stubGlobal(
      'URL',
      Object.assign(URL, { createObjectURL: () => 'blob:recording', revokeObjectURL: () => undefined }),
    );
    vi.spyOn(HTMLMediaElement.prototype, 'play').mockResolvedValue(undefined);
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('seeks the recording to the moment an item was named', async () => {
    mockApi({ 'GET /training/attempts/att-1/audio': { body: {} } });
    const attempt = makeAttempt();
    renderWithProviders(<AttemptReview attempt={attempt} />);
    const audio = await screen.findByTestId('attempt-audio', {}, { timeout: 10_000 });
    const named = attempt.score!.items.find((item) => item.status === 'named' && item.firstNamedMs !== null)!;
    const row = document.querySelector(`[data-item-key="${named.itemKey}"]`) as HTMLElement;
    fireEvent.click(row.querySelector('[data-testid="item-play"]') as HTMLElement);
    expect((audio as HTMLAudioElement).currentTime).toBeCloseTo(named.firstNamedMs! / 1000, 3);
    expect(screen.getByTestId('playing-from')).toHaveTextContent(/Playing from 0:\d\d/);
    // Grouped by stop, as the walk-around asks it: the item sits under its stop's label.
    const stop = attempt.checklist.stops.find((s) => s.itemKeys.includes(named.itemKey))!;
    expect(row.closest('[data-testid="attempt-stop"]')).toHaveTextContent(stop.label);
  }, 30_000);

  it('asks for a grade, then saves every item’s mark with the comments', async () => {
    let sent: PutTrainingReviewRequest | undefined;
    const attempt = makeAttempt();
    mockApi({
      'GET /training/attempts/att-1/audio': { body: {} },
      'PUT /training/attempts/att-1/review': (call) => {
        sent = call.body as PutTrainingReviewRequest;
        return { body: { ...attempt, grade: sent.grade, reviewedAt: '2026-12-01T09:00:00.000Z' } };
      },
    });
    renderWithProviders(<AttemptReview attempt={attempt} />);
    await userEvent.click(screen.getByRole('button', { name: 'Save review' }));
    expect(screen.getByText('Choose a grade before saving.')).toBeInTheDocument();

    const first = attempt.checklist.items[0]!;
    fireEvent.change(document.getElementById(`comment-${first.key}`) as HTMLInputElement, {
      target: { value: 'Say where you are.' },
    });
    fireEvent.change(document.getElementById(`mark-${first.key}`) as HTMLSelectElement, {
      target: { value: 'partly' },
    });
    await userEvent.click(screen.getByRole('radio', { name: 'Needs practice' }));
    await userEvent.type(screen.getByLabelText('Comment for the student'), 'Keep going.');
    await userEvent.click(screen.getByRole('button', { name: 'Save review' }));
    expect(
      await screen.findByText('Review saved. The student can see it now.', {}, { timeout: 10_000 }),
    ).toBeInTheDocument();
    await waitFor(() => expect(sent).toBeDefined());
    expect(sent?.grade).toBe('needs_practice');
    expect(sent?.comment).toBe('Keep going.');
    expect(sent?.marks).toHaveLength(attempt.checklist.items.length);
    expect(sent?.marks[0]).toEqual({ itemKey: first.key, mark: 'partly', comment: 'Say where you are.' });
  }, 30_000);
});
