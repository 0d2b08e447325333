import { Injectable, Logger } from '@nestjs/common';
import * as bcrypt from 'bcryptjs';
import type { EntityManager } from 'typeorm';
import type { DistanceUnit, Role } from '@causeway/shared';
import { Shop } from '../shops/entities/shop.entity';
import { User } from '../users/entities/user.entity';
import { readSeed } from './seed-files';

/** The one password of every demo account; documented in the README. */
export const DEMO_PASSWORD = 'demo-pass-2026';

interface ShopSeed { key: string; name: string; currency: string; locale: string; labourRateMinor: number; taxRateBp: number; distanceUnit: DistanceUnit }
interface UserSeed { email: string; displayName: string; role: Role; shop: string | null; shopOwner: boolean }

/** Demo shops and one account per role (invented; only with demo data). */
@Injectable()
export class DemoAccountsSeeder {
  private readonly logger = new Logger(DemoAccountsSeeder.name);

  async run(em: EntityManager): Promise<Map<string, Shop>> {
    const shops = new Map<string, Shop>();
    for (const s of readSeed<ShopSeed[]>('demo', 'shops.json')) {
      const { key, ...fields } = s;
      shops.set(key, await em.save(em.create(Shop, fields)));
    }
    const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
    const users = readSeed<UserSeed[]>('demo', 'users.json');
    for (const u of users) {
      const shop = u.shop ? shops.get(u.shop) : undefined;
      await em.save(em.create(User, { email: u.email, emailNormalized: u.email.toLowerCase(), passwordHash: hash, displayName: u.displayName, role: u.role, shopId: shop?.id ?? null, shopOwner: u.shopOwner }));
    }
    this.logger.log(`Demo accounts: ${users.length} users in ${shops.size} shops`);
    return shops;
  }
}
