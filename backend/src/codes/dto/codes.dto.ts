import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export const CODE_SORTS = ['code', 'title', 'subsystem'] as const;

export class SearchCodesQuery {
  @ApiPropertyOptional({ description: 'A code prefix (P04, p045) or words found in the title, description or symptoms' })
  @IsOptional() @IsString() @MaxLength(100) q?: string;

  @ApiPropertyOptional({ enum: ['P', 'C', 'B', 'U'] })
  @IsOptional() @Transform(({ value }) => (typeof value === 'string' ? value.toUpperCase() : value)) @IsIn(['P', 'C', 'B', 'U'], { message: 'must be one of P, C, B, U' }) system?: 'P' | 'C' | 'B' | 'U';

  @ApiPropertyOptional({ enum: ['sae', 'manufacturer', 'reserved'] })
  @IsOptional() @IsIn(['sae', 'manufacturer', 'reserved'], { message: 'must be one of sae, manufacturer, reserved' }) control?: 'sae' | 'manufacturer' | 'reserved';

  @ApiPropertyOptional({ description: 'Only entries for every make and for this make' })
  @IsOptional() @IsString() @MaxLength(40) make?: string;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
  @ApiPropertyOptional({ enum: CODE_SORTS }) @IsOptional() @IsIn(CODE_SORTS) sort: (typeof CODE_SORTS)[number] = 'code';
  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @IsIn(['asc', 'desc']) order: 'asc' | 'desc' = 'asc';
}

export class DecodeQuery {
  @ApiPropertyOptional({ description: 'A code as typed or read: P0456, po456, 04 56, 0456, P0456-13, 04 56 13' })
  @IsString({ message: 'is required: the code to decode' }) @MaxLength(64) input: string;

  @ApiPropertyOptional({ description: 'The DTC status byte, hexadecimal (0x2F or 2F)' })
  @IsOptional() @IsString() @MaxLength(8) status?: string;
}

export class CodeQuery {
  @ApiPropertyOptional({ description: 'The make of the vehicle, for manufacturer-controlled meanings' })
  @IsOptional() @IsString() @MaxLength(40) make?: string;
}

export class ImportCatalogueQuery {
  @ApiPropertyOptional({ description: 'true: check and report only; false: commit the valid file' })
  @IsOptional() @Transform(({ value }) => value === true || value === 'true') @IsBoolean() dryRun = true;
}
