import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiGoneResponse, ApiNotFoundResponse, ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import type { CreateEstimateResponse, EstimateDto, PublicEstimateDto } from '@causeway/shared';
import type { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { CreateEstimateDto, EstimateAnswerDto, ResendEstimateDto } from './dto/estimate.dto';
import { EstimatesService } from './estimates.service';

/**
 * The public estimate routes get their own bucket per client (PUBLIC_THROTTLE_LIMIT a minute,
 * default 60): enough for an owner reading and answering, far too few to guess 256-bit tokens.
 */
export const PUBLIC_ESTIMATE_THROTTLE = {
  default: { limit: () => Number(process.env.PUBLIC_THROTTLE_LIMIT ?? 60), ttl: 60_000 },
};

@ApiTags('estimates')
@ApiBearerAuth()
@Controller('jobs/:jobId/estimates')
export class EstimatesController {
  constructor(private readonly estimates: EstimatesService) {}

  /**
   * Makes a staged estimate from the job's current fix paths and e-mails it to the vehicle owner.
   * The answer carries the link once (only its hash is stored); `emailed: false` with the reason
   * when the e-mail could not be sent — the estimate is saved either way.
   */
  @Post()
  @ApiConflictResponse({ description: 'The job is closed' })
  create(@CurrentUser() user: AuthUser, @Param('jobId') jobId: string, @Body() dto: CreateEstimateDto): Promise<CreateEstimateResponse> {
    return this.estimates.create(user, jobId, dto);
  }

  @Get()
  list(@CurrentUser() user: AuthUser, @Param('jobId') jobId: string): Promise<EstimateDto[]> {
    return this.estimates.list(user, jobId);
  }

  /** One estimate as stored, for the printable page. */
  @Get(':estimateId')
  get(@CurrentUser() user: AuthUser, @Param('jobId') jobId: string, @Param('estimateId') estimateId: string): Promise<EstimateDto> {
    return this.estimates.get(user, jobId, estimateId);
  }

  /** Sends it again with a new link and expiry; the old link stops working. */
  @Post(':estimateId/send')
  @HttpCode(200)
  resend(@CurrentUser() user: AuthUser, @Param('jobId') jobId: string, @Param('estimateId') estimateId: string, @Body() dto: ResendEstimateDto): Promise<CreateEstimateResponse> {
    return this.estimates.resend(user, jobId, estimateId, dto);
  }
}

@ApiTags('estimates (public)')
@Controller('public/estimates')
export class PublicEstimatesController {
  constructor(private readonly estimates: EstimatesService) {}

  @Public()
  @Throttle(PUBLIC_ESTIMATE_THROTTLE)
  @Get(':token')
  @ApiNotFoundResponse({ description: 'Unknown link' })
  @ApiGoneResponse({ description: 'The link has expired' })
  get(@Param('token') token: string): Promise<PublicEstimateDto> {
    return this.estimates.publicGet(token);
  }

  /** The vehicle owner approves or declines one stage; every answer is kept with its time. */
  @Public()
  @Throttle(PUBLIC_ESTIMATE_THROTTLE)
  @Post(':token/answers')
  @ApiNotFoundResponse({ description: 'Unknown link' })
  @ApiGoneResponse({ description: 'The link has expired' })
  @ApiConflictResponse({ description: 'The job is closed' })
  answer(@Param('token') token: string, @Body() dto: EstimateAnswerDto): Promise<PublicEstimateDto> {
    return this.estimates.publicAnswer(token, dto);
  }
}
