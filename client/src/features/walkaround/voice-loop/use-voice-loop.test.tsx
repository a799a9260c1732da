import { act, renderHook, waitFor } from '@testing-library/react';
import { buildChecklist, type ItemResult } from '@yardcall/shared';
import { sampleCombination } from '@yardcall/shared/testing';
import { describe, expect, it } from 'vitest';
import { ScriptedEngine } from '@/lib/speech';
import { useVoiceLoop } from './use-voice-loop';

const checklist = buildChecklist(sampleCombination(), 'pre_trip', 'en');

describe('useVoiceLoop', () => {
  it('runs the loop on a tap and exposes the current stop and each saved answer', async () => {
    const engine = new ScriptedEngine(['good', 'good except the box is leaking']);
    const saved: ItemResult[] = [];
    const { result } = renderHook(() =>
      useVoiceLoop({ engine, checklist, host: { onResult: (r) => void saved.push(r) } }),
    );
    const [first, second, third] = checklist.stops;
    expect(result.current.state.phase).toBe('idle');
    expect(result.current.currentStop?.key).toBe(first?.key);
    act(() => result.current.start());
    await waitFor(() => expect(result.current.running).toBe(false));
    expect(saved).toHaveLength((first?.itemKeys.length ?? 0) + (second?.itemKeys.length ?? 0));
    expect(saved.filter((r) => r.answer === 'defect').map((r) => r.itemKey)).toEqual(['u1.steering.box']);
    expect(result.current.currentStop?.key).toBe(third?.key);
    expect(result.current.item?.key).toBe(third?.itemKeys[0]);
    expect(result.current.lastTiming?.latencyMs).toBeGreaterThanOrEqual(0);
  });

  it('shows a speech failure and resumes at the same stop on the next start', async () => {
    const engine = new ScriptedEngine([{ error: 'audio-capture' }, 'good']);
    const { result } = renderHook(() => useVoiceLoop({ engine, checklist, host: { onResult: () => undefined } }));
    act(() => result.current.start());
    await waitFor(() => expect(result.current.speechFailure?.code).toBe('audio-capture'));
    expect(result.current.state.phase).toBe('stalled');
    act(() => result.current.start());
    await waitFor(() => expect(result.current.state.stop).toBe(1));
    expect(result.current.speechFailure).toBeNull();
  });

  it('sends button commands into the loop', () => {
    const engine = new ScriptedEngine(() => undefined, { answerMs: 50 });
    const { result, unmount } = renderHook(() =>
      useVoiceLoop({ engine, checklist, host: { onResult: () => undefined } }),
    );
    act(() => result.current.start());
    act(() => result.current.command('skip'));
    expect(result.current.state.skipped).toEqual(checklist.stops[0]?.itemKeys);
    unmount();
  });
});
