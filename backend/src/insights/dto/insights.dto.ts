import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsISO8601, IsOptional, IsUUID } from 'class-validator';

export class InsightsQueryDto {
  @ApiPropertyOptional({ description: 'Jobs opened on or after (ISO date or date-time)' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' })
  from?: string;

  @ApiPropertyOptional({ description: 'Jobs opened on or before (a date alone means the whole day)' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' })
  to?: string;

  @ApiPropertyOptional({ description: "Admins only: the shop to look at (others always see their own shop's)" })
  @IsOptional() @IsUUID('all', { message: 'must be a shop id' })
  shopId?: string;
}
