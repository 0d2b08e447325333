import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { FieldReportDto, FieldReportSummaryDto, Page, ReviewReportDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ApproveReportDto, RejectReportDto, ReviewQueueQuery } from './dto/field-report.dto';
import { ReviewService } from './review.service';

/** The review desk (moderators and admins). */
@ApiTags('review desk')
@ApiBearerAuth()
@Roles('moderator')
@Controller('review/reports')
export class ReviewController {
  constructor(private readonly review: ReviewService) {}

  /** Submitted reports, oldest first, filtered by kind and code; other statuses for history. */
  @Get()
  queue(@Query() query: ReviewQueueQuery): Promise<Page<FieldReportSummaryDto>> {
    return this.review.queue(query);
  }

  /** The report with what approving would change, before and after. */
  @Get(':id')
  detail(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<ReviewReportDto> {
    return this.review.detail(user, id);
  }

  @Post(':id/approve')
  @HttpCode(200)
  approve(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: ApproveReportDto): Promise<FieldReportDto> {
    return this.review.approve(user, id, dto);
  }

  @Post(':id/reject')
  @HttpCode(200)
  reject(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: RejectReportDto): Promise<FieldReportDto> {
    return this.review.reject(user, id, dto);
  }
}
