import type { ReactNode } from 'react';
import { renderHook, waitFor } from '@testing-library/react';
import { QueryClientProvider } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { createQueryClient } from '@/lib/query-client';
import { makeVehicle } from '@/testing/fixtures';
import { mockApi } from '@/testing/mock-api';
import { byUnitNumber, useVehicles, vehiclesQueryOptions } from './vehicles';

const units = [
  makeVehicle({ id: 'veh-10', unitNumber: 'KV-10' }),
  makeVehicle({ id: 'veh-9', unitNumber: 'KV-9' }),
  makeVehicle({ id: 'veh-101', unitNumber: 'KV-101' }),
];

describe("the organisation's units, one list for every screen", () => {
  it('answers from the list the start screen filled from the phone, sorted for a pick list, without asking', async () => {
    const { calls } = mockApi({});
    const queryClient = createQueryClient();
    queryClient.setQueryData(vehiclesQueryOptions().queryKey, units);
    const wrapper = ({ children }: { children: ReactNode }) => (
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    );

    const { result } = renderHook(() => ({ all: useVehicles(), sorted: useVehicles({}, byUnitNumber) }), { wrapper });

    await waitFor(() => expect(result.current.sorted.isSuccess).toBe(true));
    expect(result.current.all.data?.map((v) => v.unitNumber)).toEqual(['KV-10', 'KV-9', 'KV-101']);
    expect(result.current.sorted.data?.map((v) => v.unitNumber)).toEqual(['KV-9', 'KV-10', 'KV-101']);
    expect(calls).toHaveLength(0);
  });
});
