import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import type { Page, VehicleDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateVehicleDto, UpdateVehicleDto, VehicleListQuery } from './dto/vehicle.dto';
import { VehiclesService } from './vehicles.service';

@ApiTags('vehicles')
@ApiBearerAuth()
@Controller('vehicles')
export class VehiclesController {
  constructor(private readonly vehicles: VehiclesService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: VehicleListQuery): Promise<Page<VehicleDto>> {
    return this.vehicles.list(user, query);
  }

  @Post()
  @ApiConflictResponse({ description: 'The VIN is already registered in this shop' })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateVehicleDto): Promise<VehicleDto> {
    return this.vehicles.create(user, dto);
  }

  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<VehicleDto> {
    return this.vehicles.get(user, id);
  }

  @Patch(':id')
  @ApiConflictResponse({ description: 'odometer-lower: the reading is lower than the last one; resend with confirmOdometerLower: true. Or the VIN is taken.' })
  update(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: UpdateVehicleDto): Promise<VehicleDto> {
    return this.vehicles.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @ApiConflictResponse({ description: 'The vehicle has jobs' })
  remove(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<void> {
    return this.vehicles.remove(user, id);
  }
}
