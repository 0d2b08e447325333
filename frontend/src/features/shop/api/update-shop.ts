import type { ShopDto, UserDto } from '@causeway/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { CURRENT_USER_QUERY_KEY } from '@/lib/current-user';
import type { MutationConfig } from '@/lib/react-query';
import type { ShopSettings } from '@/utils/shop-form';

/** `PATCH /api/shops/mine` (shop owners): the settings of the user's shop. */
export function updateShop(data: ShopSettings): Promise<ShopDto> {
  return api.patch<ShopDto>('/shops/mine', data);
}

type UseUpdateShopOptions = { mutationConfig?: MutationConfig<typeof updateShop> };

export function useUpdateShop({ mutationConfig }: UseUpdateShopOptions = {}) {
  const queryClient = useQueryClient();
  const { onSuccess, ...rest } = mutationConfig ?? {};
  return useMutation({
    ...rest,
    mutationFn: updateShop,
    onSuccess: (...args) => {
      const shop = args[0];
      // The shop travels with the signed-in user; everything that formats money reads it there.
      queryClient.setQueryData<UserDto>(CURRENT_USER_QUERY_KEY, (user) => (user ? { ...user, shop } : user));
      return onSuccess?.(...args);
    },
  });
}
