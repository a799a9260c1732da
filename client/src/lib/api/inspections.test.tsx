import type { ReactNode } from 'react';
import { renderHook, waitFor } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import type { InspectionResponse, VoiceNoteResponse } from '@yardcall/shared';
import { createQueryClient } from '@/lib/query-client';
import { mockApi } from '@/testing/mock-api';
import { useInspection } from './inspections';

const note = { id: 'note-1', itemKey: 'tractor.steer.left.tire', durationMs: 4200, heard: 'cut in the sidewall' };
const report = { id: 'insp-7', status: 'submitted', notes: [note] } as unknown as InspectionResponse;
const notesOf = (inspection: InspectionResponse): VoiceNoteResponse[] => inspection.notes;

function wrapper({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={createQueryClient()}>{children}</QueryClientProvider>;
}

describe('one query per report', () => {
  it('serves the whole report and the notes the shop selects from one request', async () => {
    const { calls } = mockApi({ 'GET /inspections/insp-7': { body: report } });
    const { result } = renderHook(
      () => ({ whole: useInspection('insp-7'), notes: useInspection('insp-7', { select: notesOf }) }),
      { wrapper },
    );

    await waitFor(() => expect(result.current.notes.isSuccess).toBe(true));
    expect(result.current.whole.data).toEqual(report);
    expect(result.current.notes.data).toEqual([note]);
    expect(calls.map((call) => `${call.method} ${call.path}`)).toEqual(['GET /inspections/insp-7']);
  });

  it('asks nothing while the walk-around has no server id yet', async () => {
    const { calls } = mockApi({});
    const { result } = renderHook(() => useInspection(undefined), { wrapper });

    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(result.current.fetchStatus).toBe('idle');
    expect(calls).toHaveLength(0);
  });
});
