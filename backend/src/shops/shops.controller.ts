import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { InviteDto, ShopDto, UserDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { ShopSettingsDto } from '../auth/dto/auth.dto';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ShopOwner } from '../common/decorators/roles.decorator';
import { CreateInviteDto } from './dto/invite.dto';
import { ShopsService } from './shops.service';

@ApiTags('shops')
@ApiBearerAuth()
@Controller('shops/mine')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get()
  mine(@CurrentUser() user: AuthUser): Promise<ShopDto> {
    return this.shops.mine(user);
  }

  @ShopOwner()
  @Patch()
  update(@CurrentUser() user: AuthUser, @Body() dto: ShopSettingsDto): Promise<ShopDto> {
    return this.shops.update(user, dto);
  }

  @ShopOwner()
  @Post('invites')
  createInvite(@CurrentUser() user: AuthUser, @Body() dto: CreateInviteDto): Promise<InviteDto> {
    return this.shops.createInvite(user, dto);
  }

  @ShopOwner()
  @Get('invites')
  invites(@CurrentUser() user: AuthUser): Promise<InviteDto[]> {
    return this.shops.listInvites(user);
  }

  @ShopOwner()
  @Get('members')
  members(@CurrentUser() user: AuthUser): Promise<UserDto[]> {
    return this.shops.members(user);
  }
}
