import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { VehicleRequest, VehicleResponse } from '@yardcall/shared';
import { api } from '@/lib/api-client';
import { vehicleKeys } from './vehicle-keys';

export function createVehicle(body: VehicleRequest): Promise<VehicleResponse> {
  return api.post<VehicleResponse>('/vehicles', body);
}

export function useCreateVehicle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVehicle,
    onSuccess: async (vehicle) => {
      queryClient.setQueryData(vehicleKeys.detail(vehicle.id), vehicle);
      await queryClient.invalidateQueries({ queryKey: vehicleKeys.lists() });
    },
  });
}
