import { ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomBytes } from 'node:crypto';
import { Repository } from 'typeorm';
import type { InviteDto, ShopDto, UserDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import type { ShopSettingsDto } from '../auth/dto/auth.dto';
import { User } from '../users/entities/user.entity';
import { toShopDto, toUserDto } from '../users/users.mapper';
import type { CreateInviteDto } from './dto/invite.dto';
import { Invite } from './entities/invite.entity';
import { Shop } from './entities/shop.entity';

const INVITE_DAYS = 14;
/** Crockford-style alphabet: no I, L, O or U, so a code read aloud or off paper survives. */
const INVITE_ALPHABET = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

function newInviteCode(): string {
  const bytes = randomBytes(12);
  const chars = Array.from(bytes, (b) => INVITE_ALPHABET[b % 32]).join('');
  return `${chars.slice(0, 4)}-${chars.slice(4, 8)}-${chars.slice(8, 12)}`;
}

function toInviteDto(invite: Invite): InviteDto {
  return { code: invite.code, role: invite.role, expiresAt: invite.expiresAt.toISOString(), usedAt: invite.usedAt ? new Date(invite.usedAt).toISOString() : null };
}

@Injectable()
export class ShopsService {
  constructor(
    @InjectRepository(Shop) private readonly shops: Repository<Shop>,
    @InjectRepository(Invite) private readonly invites: Repository<Invite>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {}

  /** The caller's shop; every shop-owned resource is looked up through this. */
  async shopOf(user: AuthUser): Promise<Shop> {
    if (!user.shopId) throw new ForbiddenException('Your account does not belong to a shop');
    const shop = await this.shops.findOne({ where: { id: user.shopId } });
    if (!shop) throw new NotFoundException('Shop not found');
    return shop;
  }

  async mine(user: AuthUser): Promise<ShopDto> {
    return toShopDto(await this.shopOf(user));
  }

  async update(user: AuthUser, dto: ShopSettingsDto): Promise<ShopDto> {
    const shop = await this.shopOf(user);
    Object.assign(shop, dto, { currency: dto.currency.toUpperCase() });
    return toShopDto(await this.shops.save(shop));
  }

  async createInvite(user: AuthUser, dto: CreateInviteDto): Promise<InviteDto> {
    const shop = await this.shopOf(user);
    const invite = this.invites.create({ code: newInviteCode(), shopId: shop.id, role: dto.role, createdById: user.id, expiresAt: new Date(Date.now() + INVITE_DAYS * 86_400_000), usedAt: null });
    return toInviteDto(await this.invites.save(invite));
  }

  async listInvites(user: AuthUser): Promise<InviteDto[]> {
    const shop = await this.shopOf(user);
    const rows = await this.invites.find({ where: { shopId: shop.id }, order: { createdAt: 'DESC' }, take: 100 });
    return rows.map(toInviteDto);
  }

  async members(user: AuthUser): Promise<UserDto[]> {
    const shop = await this.shopOf(user);
    const rows = await this.users.find({ where: { shopId: shop.id }, relations: { shop: true }, order: { displayName: 'ASC' } });
    return rows.map(toUserDto);
  }
}
