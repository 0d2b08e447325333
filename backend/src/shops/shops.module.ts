import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { User } from '../users/entities/user.entity';
import { Invite } from './entities/invite.entity';
import { Shop } from './entities/shop.entity';
import { ShopsController } from './shops.controller';
import { ShopsService } from './shops.service';

/** Global: every shop-owned feature resolves the caller's shop through ShopsService. */
@Global()
@Module({
  imports: [TypeOrmModule.forFeature([Shop, Invite, User])],
  controllers: [ShopsController],
  providers: [ShopsService],
  exports: [ShopsService],
})
export class ShopsModule {}
