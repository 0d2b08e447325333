import type { VehicleDto, VehiclePatch } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { VEHICLES_QUERY_KEY } from './get-vehicles';
import { vehicleQueryKey } from './get-vehicle';

export interface UpdateVehicleInput {
  id: string;
  data: VehiclePatch;
}

/** `PATCH /api/vehicles/:id`: same answers as creating, plus 404 for another shop's vehicle. */
export function updateVehicle({ id, data }: UpdateVehicleInput): Promise<VehicleDto> {
  return api.patch<VehicleDto>(`/vehicles/${encodeURIComponent(id)}`, data);
}

type UseUpdateVehicleOptions = { mutationConfig?: MutationConfig<typeof updateVehicle> };

export function useUpdateVehicle({ mutationConfig }: UseUpdateVehicleOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateVehicle,
    onSuccess: async (...args) => {
      queryClient.setQueryData(vehicleQueryKey(args[0].id), args[0]);
      await queryClient.invalidateQueries({ queryKey: VEHICLES_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
