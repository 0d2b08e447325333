import type { VehicleDto, VehicleInput } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { VEHICLES_QUERY_KEY } from './get-vehicles';

/**
 * `POST /api/vehicles`: a 400 names the VIN position at fault; a 409 says the VIN is taken, or
 * (`details.reason: 'odometer-lower'`) that the reading needs confirming.
 */
export function createVehicle(data: VehicleInput): Promise<VehicleDto> {
  return api.post<VehicleDto>('/vehicles', data);
}

type UseCreateVehicleOptions = { mutationConfig?: MutationConfig<typeof createVehicle> };

export function useCreateVehicle({ mutationConfig }: UseCreateVehicleOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: createVehicle,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: VEHICLES_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
