import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { VehicleRequest, VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './vehicle-keys';

export function updateVehicle(id: string, body: Partial<VehicleRequest>): Promise<VehicleResponse> {
  return api.patch<VehicleResponse>(`/vehicles/${encodeURIComponent(id)}`, body);
}

export function useUpdateVehicle(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: Partial<VehicleRequest>) => updateVehicle(id, body),
    onSuccess: async (vehicle) => {
      queryClient.setQueryData(vehicleKeys.detail(vehicle.id), vehicle);
      await queryClient.invalidateQueries({ queryKey: vehicleKeys.lists() });
    },
  });
}
