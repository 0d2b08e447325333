import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min, Validate } from 'class-validator';
import { IsoCurrencyRule, LocaleRule } from '../../auth/dto/auth.dto';

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const upper = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toUpperCase() : value);

/** The vehicle a likelihood or fix path is for; every field optional. */
export class VehicleQueryDto {
  @ApiPropertyOptional({ example: 'Halden', description: 'Make; absent = any vehicle' })
  @IsOptional() @Transform(trim) @IsString() @MaxLength(40) make?: string;

  @ApiPropertyOptional({ example: 'Tarn', description: 'Model (needs make)' })
  @IsOptional() @Transform(trim) @IsString() @MaxLength(60) model?: string;

  @ApiPropertyOptional({ example: '1.6 T', description: 'Engine (needs make and model)' })
  @IsOptional() @Transform(trim) @IsString() @MaxLength(60) engine?: string;

  @ApiPropertyOptional({ example: 2019, description: 'Model year' })
  @IsOptional() @Type(() => Number) @IsInt() @Min(1950) @Max(2100) year?: number;
}

/**
 * Money context. A signed-in user of a shop gets the shop's; an account without a shop must
 * give `labourRateMinor` and `currency`. Given values override the shop's (what-if).
 */
export class MoneyQueryDto extends VehicleQueryDto {
  @ApiPropertyOptional({ example: 9500, description: 'Labour per hour before tax, integer minor units' })
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(100_000_000) labourRateMinor?: number;

  @ApiPropertyOptional({ example: 'GBP' })
  @IsOptional() @Transform(upper) @IsString() @Validate(IsoCurrencyRule) currency?: string;

  @ApiPropertyOptional({ example: 2000, description: 'Sales tax in basis points' })
  @IsOptional() @Type(() => Number) @IsInt() @Min(0) @Max(10_000) taxRateBp?: number;

  @ApiPropertyOptional({ example: 'en-GB' })
  @IsOptional() @IsString() @MaxLength(35) @Validate(LocaleRule) locale?: string;
}

export class FixPathQueryDto extends MoneyQueryDto {
  @ApiPropertyOptional({ example: 'fuel-cap,purge-valve', description: 'Part keys already ruled out in this job, comma-separated' })
  @IsOptional() @IsString() @MaxLength(1000) @Matches(/^[a-z0-9-]+(,[a-z0-9-]+)*$/, { message: 'must be part keys separated by commas, such as fuel-cap,purge-valve' }) exclude?: string;
}

export class CausesListQueryDto {
  @ApiPropertyOptional({ example: 'P0171', description: 'Only the possible causes of this code' })
  @IsOptional() @IsString() @MaxLength(64) code?: string;
}

class AdHocCauseDoc {
  @ApiProperty({ example: 'maf' }) key: string;
  @ApiPropertyOptional() label?: string;
  @ApiProperty({ example: 0.3, minimum: 0, maximum: 1 }) probability: number;
  @ApiProperty({ example: 180, minimum: 0 }) replaceCost: number;
  @ApiPropertyOptional({ example: 25, minimum: 0 }) checkCost?: number;
  @ApiPropertyOptional({ description: 'Must be found by its check before it may be replaced (needs checkCost)' }) checkFirst?: boolean;
  @ApiPropertyOptional({ description: 'A key of teardowns' }) teardown?: string;
}

class AdHocAddOnDoc {
  @ApiProperty() key: string;
  @ApiPropertyOptional() label?: string;
  @ApiProperty() teardown: string;
  @ApiProperty({ minimum: 0 }) cost: number;
}

/**
 * OpenAPI description of `POST /api/fix-paths`. The body itself is checked by the shared
 * `validatePlanInput` (a free-form teardown map does not fit class-validator), with unknown
 * fields refused as the global pipe would.
 */
export class AdHocFixPathDoc {
  @ApiProperty({ type: [AdHocCauseDoc], maxItems: 200 }) causes: AdHocCauseDoc[];
  @ApiProperty({ type: 'object', additionalProperties: { type: 'number', minimum: 0 }, example: { K: 150 }, description: 'Teardown key → opening cost' }) teardowns: Record<string, number>;
  @ApiProperty({ example: 0, minimum: 0 }) verificationCost: number;
  @ApiPropertyOptional({ minimum: 0, description: 'Absent = escalation not offered' }) escalationCost?: number;
  @ApiProperty({ example: 0, minimum: 0, maximum: 1 }) unlistedProbability: number;
  @ApiPropertyOptional({ type: [AdHocAddOnDoc] }) addOns?: AdHocAddOnDoc[];
}
