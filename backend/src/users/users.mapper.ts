import type { ShopDto, UserDto } from '@causeway/shared';
import type { Shop } from '../shops/entities/shop.entity';
import type { User } from './entities/user.entity';

export function toShopDto(shop: Shop): ShopDto {
  return {
    id: shop.id,
    name: shop.name,
    currency: shop.currency,
    locale: shop.locale,
    labourRateMinor: shop.labourRateMinor,
    taxRateBp: shop.taxRateBp,
    distanceUnit: shop.distanceUnit,
  };
}

export function toUserDto(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    shopOwner: user.shopOwner,
    disabled: user.disabled,
    shop: user.shop ? toShopDto(user.shop) : null,
    createdAt: new Date(user.createdAt).toISOString(),
  };
}
