import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { VEHICLES_QUERY_KEY } from './get-vehicles';

/** `DELETE /api/vehicles/:id`: a 409 when the vehicle has jobs (they keep their history). */
export function deleteVehicle(id: string): Promise<void> {
  return api.delete<void>(`/vehicles/${encodeURIComponent(id)}`);
}

type UseDeleteVehicleOptions = { mutationConfig?: MutationConfig<typeof deleteVehicle> };

export function useDeleteVehicle({ mutationConfig }: UseDeleteVehicleOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: deleteVehicle,
    onSuccess: async (...args) => {
      queryClient.removeQueries({ queryKey: [...VEHICLES_QUERY_KEY, 'detail', args[1]] });
      await queryClient.invalidateQueries({ queryKey: VEHICLES_QUERY_KEY });
      return onSuccess?.(...args);
    },
  });
}
