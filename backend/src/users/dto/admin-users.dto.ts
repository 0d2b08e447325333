import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { ROLES, type Role } from '@causeway/shared';

export class ListUsersQuery {
  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) page = 1;
  @ApiPropertyOptional({ default: 20, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 20;
  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(100) q?: string;
  @ApiPropertyOptional({ enum: ROLES }) @IsOptional() @IsIn(ROLES) role?: Role;
  @ApiPropertyOptional({ enum: ['email', 'displayName', 'createdAt', 'role'] }) @IsOptional() @IsIn(['email', 'displayName', 'createdAt', 'role']) sort: 'email' | 'displayName' | 'createdAt' | 'role' = 'createdAt';
  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @IsIn(['asc', 'desc']) order: 'asc' | 'desc' = 'desc';
}

export class UpdateUserDto {
  @ApiPropertyOptional({ enum: ROLES }) @IsOptional() @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` }) role?: Role;
  @ApiPropertyOptional() @IsOptional() @IsBoolean() disabled?: boolean;
}
