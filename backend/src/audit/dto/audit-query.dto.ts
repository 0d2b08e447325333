import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsInt, IsISO8601, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';

export class AuditQuery {
  @ApiPropertyOptional({ description: 'Actor: a user id, or part of their e-mail address' })
  @IsOptional() @IsString() @MaxLength(254) actor?: string;

  @ApiPropertyOptional({ description: 'An action (`cause.update`), or a prefix ending in a dot (`cause.`)', example: 'report.approve' })
  @IsOptional() @Matches(/^[a-z][a-z-]*(\.[a-z-]*)?$/, { message: 'must look like report.approve, or a prefix such as cause.' }) @MaxLength(40) action?: string;

  @ApiPropertyOptional({ example: 'possible-cause' })
  @IsOptional() @Matches(/^[a-z][a-z-]*$/, { message: 'must be an entity type such as possible-cause' }) @MaxLength(40) entityType?: string;

  @ApiPropertyOptional()
  @IsOptional() @IsString() @MaxLength(160) entityId?: string;

  @ApiPropertyOptional({ description: 'ISO 8601 date or date-time, inclusive' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' }) from?: string;

  @ApiPropertyOptional({ description: 'ISO 8601 date (the whole day) or date-time, inclusive' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' }) to?: string;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
}
