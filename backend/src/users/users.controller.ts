import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Page, UserDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ListUsersQuery, UpdateUserDto } from './dto/admin-users.dto';
import { UsersService } from './users.service';

@ApiTags('admin')
@ApiBearerAuth()
@Roles('admin')
@Controller('admin/users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(@Query() query: ListUsersQuery): Promise<Page<UserDto>> {
    return this.users.list(query);
  }

  @Patch(':id')
  update(@CurrentUser() admin: AuthUser, @Param('id', new ParseUUIDPipe({ version: '4' })) id: string, @Body() dto: UpdateUserDto): Promise<UserDto> {
    return this.users.update(admin, id, dto);
  }
}
