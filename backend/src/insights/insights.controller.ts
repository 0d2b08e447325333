import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { InsightsDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ShopOwner } from '../common/decorators/roles.decorator';
import { InsightsQueryDto } from './dto/insights.dto';
import { InsightsService } from './insights.service';

@ApiTags('insights')
@ApiBearerAuth()
@Controller('insights')
export class InsightsController {
  constructor(private readonly insights: InsightsService) {}

  /** For the shop's owner (and admins): jobs by code, first-time-fix rate, cost to resolve against the plan, parts replaced in vain. */
  @ShopOwner()
  @Get()
  get(@CurrentUser() user: AuthUser, @Query() query: InsightsQueryDto): Promise<InsightsDto> {
    return this.insights.insights(user, query);
  }
}
