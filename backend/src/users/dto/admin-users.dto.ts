import { ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min, ValidateIf } from 'class-validator';
import { ROLES, type Role } from '@causeway/shared';

export class ListUsersQuery {
  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) page = 1;
  @ApiPropertyOptional({ default: 20, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 20;
  @ApiPropertyOptional() @IsOptional() @IsString() @MaxLength(100) q?: string;
  @ApiPropertyOptional({ enum: ROLES }) @IsOptional() @IsIn(ROLES) role?: Role;
  @ApiPropertyOptional({ enum: ['email', 'displayName', 'createdAt', 'role'] }) @IsOptional() @IsIn(['email', 'displayName', 'createdAt', 'role']) sort: 'email' | 'displayName' | 'createdAt' | 'role' = 'createdAt';
  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @IsIn(['asc', 'desc']) order: 'asc' | 'desc' = 'desc';
}

/** Absent means unchanged; null is not a value here (it would reach the NOT NULL columns: a 500). */
const Present = () => ValidateIf((_o: object, v: unknown) => v !== undefined);

export class UpdateUserDto {
  @ApiPropertyOptional({ enum: ROLES }) @Present() @IsIn(ROLES, { message: `must be one of ${ROLES.join(', ')}` }) role?: Role;
  @ApiPropertyOptional() @Present() @IsBoolean({ message: 'must be true or false' }) disabled?: boolean;
}
