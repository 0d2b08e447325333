import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiTags } from '@nestjs/swagger';
import type { JobDto, JobSummaryDto, Page } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CloseJobDto, CreateJobDto, CreateStepDto, JobListQueryDto } from './dto/job.dto';
import { JobsService } from './jobs.service';

@ApiTags('jobs')
@ApiBearerAuth()
@Controller('jobs')
export class JobsController {
  constructor(private readonly jobs: JobsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: JobListQueryDto): Promise<Page<JobSummaryDto>> {
    return this.jobs.list(user, query);
  }

  /** Opens a job; each code's fix-path expected cost at this moment is kept for the shop's insights. */
  @Post()
  @ApiConflictResponse({ description: "odometer-lower: the reading is lower than the vehicle's last one; resend with confirmOdometerLower: true" })
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateJobDto): Promise<JobDto> {
    return this.jobs.create(user, dto);
  }

  /** The job with its timeline and the current fix path of each code, recomputed on every read. */
  @Get(':id')
  get(@CurrentUser() user: AuthUser, @Param('id') id: string): Promise<JobDto> {
    return this.jobs.get(user, id);
  }

  @Post(':id/steps')
  @ApiConflictResponse({ description: 'The job is closed' })
  addStep(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: CreateStepDto): Promise<JobDto> {
    return this.jobs.addStep(user, id, dto);
  }

  @Post(':id/close')
  @HttpCode(200)
  @ApiConflictResponse({ description: 'The job is already closed' })
  close(@CurrentUser() user: AuthUser, @Param('id') id: string, @Body() dto: CloseJobDto): Promise<JobDto> {
    return this.jobs.close(user, id, dto);
  }
}
