import type { ImportMappingDto, SaveImportMappingRequest } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { MutationConfig } from '@/lib/react-query';
import { getMappingsQueryOptions } from './get-mappings';

/** `POST /api/imports/mappings`: saves a mapping under a name for the shop (the same name is replaced). */
export function saveMapping(data: SaveImportMappingRequest): Promise<ImportMappingDto> {
  return api.post<ImportMappingDto>('/imports/mappings', data);
}

type Options = { mutationConfig?: MutationConfig<typeof saveMapping> };

export function useSaveMapping({ mutationConfig }: Options = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: saveMapping,
    onSuccess: async (...args) => {
      await queryClient.invalidateQueries({ queryKey: getMappingsQueryOptions().queryKey });
      return onSuccess?.(...args);
    },
  });
}
