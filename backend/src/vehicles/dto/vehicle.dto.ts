import { ApiProperty, ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsEmail, IsIn, IsInt, IsNotEmpty, IsNumber, IsOptional, IsString, Max, MaxLength, Min, ValidateBy } from 'class-validator';
import { VEHICLE_SORTS, type VehicleInput, type VehicleSort } from '@causeway/shared';

/** Trims text; an empty optional text becomes null (cleared). */
const trimmed = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));
const trimmedOrNull = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() || null : value));

/** The longest odometer reading accepted, in the shop's unit. */
export const MAX_ODOMETER = 2_000_000;

/**
 * At most one decimal place. Not IsNumber's maxDecimalPlaces: that throws on a number that
 * prints with an exponent (1e-7), which made a 500 of a bad odometer reading.
 */
export const OneDecimalAtMost = () =>
  ValidateBy({ name: 'oneDecimalAtMost', validator: { validate: (v: unknown) => typeof v !== 'number' || Number(v.toFixed(1)) === v, defaultMessage: () => 'must have at most one decimal place' } });

export class CreateVehicleDto implements VehicleInput {
  @ApiProperty({ example: '1HGCM82633A004352', description: '17 characters, no I, O or Q; spaces and dashes are ignored. The check digit (position 9, 49 CFR 565.15) must match for North-American VINs (first character 1–5).' })
  @IsString() @MaxLength(40)
  vin: string;

  @ApiProperty({ example: 'Halden' }) @trimmed() @IsString() @IsNotEmpty({ message: 'is required' }) @MaxLength(40)
  make: string;

  @ApiProperty({ example: 'Tarn' }) @trimmed() @IsString() @IsNotEmpty({ message: 'is required' }) @MaxLength(60)
  model: string;

  @ApiPropertyOptional({ example: '1.6 T', nullable: true }) @IsOptional() @trimmedOrNull() @IsString() @MaxLength(40)
  engine?: string | null;

  @ApiPropertyOptional({ example: 2019, nullable: true, description: 'Model year; read from VIN position 10 (with the position-7 rule) when absent' })
  @IsOptional() @IsInt({ message: 'must be a whole year' }) @Min(1950) @Max(2100)
  year?: number | null;

  @ApiPropertyOptional({ example: 'KX19 HTN', nullable: true }) @IsOptional() @trimmedOrNull() @IsString() @MaxLength(20)
  plate?: string | null;

  @ApiPropertyOptional({ example: 52320, nullable: true, description: "Odometer in the shop's unit (km or mi); stored in km" })
  @IsOptional() @IsNumber({ allowNaN: false, allowInfinity: false }) @OneDecimalAtMost() @Min(0) @Max(MAX_ODOMETER)
  odometer?: number | null;

  @ApiPropertyOptional({ nullable: true }) @IsOptional() @trimmedOrNull() @IsString() @MaxLength(120)
  ownerName?: string | null;

  @ApiPropertyOptional({ nullable: true, description: 'Where staged estimates are sent' })
  @IsOptional() @trimmedOrNull() @IsEmail({}, { message: 'must be an e-mail address' }) @MaxLength(254)
  ownerEmail?: string | null;

  @ApiPropertyOptional({ description: 'true to accept an odometer reading lower than the last one (after a 409 odometer-lower answer)' })
  @IsOptional() @IsBoolean()
  confirmOdometerLower?: boolean;
}

export class UpdateVehicleDto extends PartialType(CreateVehicleDto) {}

export class VehicleListQuery {
  @ApiPropertyOptional({ description: 'Part of a VIN, registration plate, owner name or owner e-mail' })
  @IsOptional() @IsString() @MaxLength(100) q?: string;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
  @ApiPropertyOptional({ enum: VEHICLE_SORTS }) @IsOptional() @IsIn(VEHICLE_SORTS, { message: `must be one of ${VEHICLE_SORTS.join(', ')}` }) sort: VehicleSort = 'updatedAt';
  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @IsIn(['asc', 'desc']) order: 'asc' | 'desc' = 'desc';
}
