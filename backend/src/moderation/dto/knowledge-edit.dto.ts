import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsBoolean, IsIn, IsObject, IsOptional, IsString, MaxLength, ValidateIf, ValidateNested } from 'class-validator';
import { KNOWLEDGE_LIMITS, PART_SYSTEMS, type PartSystem } from '@causeway/shared';
import { IsoCurrency, KnowledgeKey, ModelYear, NumberBetween, TextLength, Trim, TrimToNull } from './validators';

/** Absent = unchanged; null is validated (and refused) for fields that cannot be empty. */
const Present = () => ValidateIf((_o: object, v: unknown) => v !== undefined);

const H = KNOWLEDGE_LIMITS.hoursMax;
const COST = KNOWLEDGE_LIMITS.partCostMinorMax;

export class CheckDto {
  @ApiProperty({ example: 'Pressure-test the cap on the adaptor' })
  @Trim() @TextLength(3, 1000) description: string;

  @ApiProperty({ example: 0.2, description: 'Labour hours of the check' })
  @NumberBetween(0, H) hours: number;

  @ApiProperty({ description: 'The cause must be found by the check before it may be replaced' })
  @IsBoolean({ message: 'must be true or false' }) mustPrecede: boolean;
}

/** Vehicle scope: null (or absent) = any. */
export class ScopeDto {
  @ApiPropertyOptional({ nullable: true, example: 'Halden' })
  @IsOptional() @TrimToNull() @TextLength(1, 40) make?: string | null;

  @ApiPropertyOptional({ nullable: true, example: 'Tarn' })
  @IsOptional() @TrimToNull() @TextLength(1, 60) model?: string | null;

  @ApiPropertyOptional({ nullable: true, example: '1.6 T' })
  @IsOptional() @TrimToNull() @TextLength(1, 60) engine?: string | null;

  @ApiPropertyOptional({ nullable: true, example: 2015 })
  @IsOptional() @ModelYear() yearFrom?: number | null;

  @ApiPropertyOptional({ nullable: true, example: 2020 })
  @IsOptional() @ModelYear() yearTo?: number | null;
}

export class CreateCauseDto extends ScopeDto {
  @ApiProperty({ example: 'P0456' })
  @IsString({ message: 'is required: a fault code such as P0456' }) @MaxLength(16) code: string;

  @ApiProperty({ example: 'fuel-cap' })
  @KnowledgeKey(60) partKey: string;

  @ApiProperty({ example: 0.3, description: 'Prior weight w_i, 0–1; per code and scope the priors sum to at most 1' })
  @NumberBetween(0, 1) prior: number;

  @ApiProperty({ example: 2200, description: 'Part price in integer minor units of `currency`' })
  @NumberBetween(0, COST, { integer: true }) partCostMinor: number;

  @ApiProperty({ example: 'GBP' })
  @IsoCurrency() currency: string;

  @ApiProperty({ example: 0.1, description: 'Labour hours to replace, excluding the teardown' })
  @NumberBetween(0, H) replaceHours: number;

  @ApiPropertyOptional({ nullable: true, example: 'halden-tarn-fuel-tank-drop' })
  @IsOptional() @KnowledgeKey(80) teardownKey?: string | null;

  @ApiPropertyOptional({ type: CheckDto, nullable: true })
  @IsOptional() @IsObject({ message: 'must be an object { description, hours, mustPrecede } or null' }) @ValidateNested() @Type(() => CheckDto) check?: CheckDto | null;
}

export class UpdateCauseDto extends ScopeDto {
  @ApiPropertyOptional({ example: 0.3 })
  @Present() @NumberBetween(0, 1) prior?: number;

  @ApiPropertyOptional({ example: 2200 })
  @Present() @NumberBetween(0, COST, { integer: true }) partCostMinor?: number;

  @ApiPropertyOptional({ example: 'GBP' })
  @Present() @IsoCurrency() currency?: string;

  @ApiPropertyOptional({ example: 0.1 })
  @Present() @NumberBetween(0, H) replaceHours?: number;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional() @KnowledgeKey(80) teardownKey?: string | null;

  @ApiPropertyOptional({ type: CheckDto, nullable: true })
  @IsOptional() @IsObject({ message: 'must be an object { description, hours, mustPrecede } or null' }) @ValidateNested() @Type(() => CheckDto) check?: CheckDto | null;
}

export class CreatePartDto {
  @ApiProperty({ example: 'turbo-diverter-valve' })
  @KnowledgeKey(60) key: string;

  @ApiProperty({ example: 'Turbo diverter valve' })
  @Trim() @TextLength(1, 160) name: string;

  @ApiProperty({ enum: PART_SYSTEMS, description: 'Decides the safety cautions that come with the part' })
  @IsIn(PART_SYSTEMS, { message: `must be one of ${PART_SYSTEMS.join(', ')}` }) system: PartSystem;
}

export class UpdatePartDto {
  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(1, 160) name?: string;

  @ApiPropertyOptional({ enum: PART_SYSTEMS })
  @Present() @IsIn(PART_SYSTEMS, { message: `must be one of ${PART_SYSTEMS.join(', ')}` }) system?: PartSystem;
}

export class CreateTeardownDto extends ScopeDto {
  @ApiProperty({ example: 'morrow-strand-intake-plenum' })
  @KnowledgeKey(80) key: string;

  @ApiProperty({ example: 'Remove and refit the upper intake plenum' })
  @Trim() @TextLength(1, 240) name: string;

  @ApiProperty({ example: 1.6, description: 'Labour hours to take apart and put back' })
  @NumberBetween(0, H) hours: number;

  @ApiProperty({ type: [String], example: ['fuel-vapour'], description: 'Safety caution keys' })
  @IsArray({ message: 'must be a list of caution keys' }) @ArrayMaxSize(10) @KnowledgeKey(40, { each: true }) cautions: string[];
}

export class UpdateTeardownDto extends ScopeDto {
  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(1, 240) name?: string;

  @ApiPropertyOptional()
  @Present() @NumberBetween(0, H) hours?: number;

  @ApiPropertyOptional({ type: [String] })
  @Present() @IsArray({ message: 'must be a list of caution keys' }) @ArrayMaxSize(10) @KnowledgeKey(40, { each: true }) cautions?: string[];
}

export class VerificationEditDto {
  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(0, 120) monitor?: string;

  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(0, 4000) procedure?: string;

  @ApiPropertyOptional({ description: 'Labour hours to clear, drive and confirm' })
  @Present() @NumberBetween(0, H) hours?: number;
}

export class EscalationEditDto {
  @ApiProperty()
  @NumberBetween(0, 1000) hours: number;

  @ApiProperty()
  @Trim() @TextLength(0, 4000) description: string;
}

export class CodeEditDto {
  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(1, 200) title?: string;

  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(0, 4000) description?: string;

  @ApiPropertyOptional()
  @Present() @Trim() @TextLength(1, 120) subsystem?: string;

  @ApiPropertyOptional({ type: [String] })
  @Present() @IsArray({ message: 'must be a list of texts' }) @ArrayMaxSize(30) @TextLength(1, 300, { each: true }) symptoms?: string[];

  @ApiPropertyOptional({ type: VerificationEditDto })
  @Present() @IsObject({ message: 'must be an object { monitor?, procedure?, hours? }' }) @ValidateNested() @Type(() => VerificationEditDto) verification?: VerificationEditDto;

  @ApiPropertyOptional({ type: EscalationEditDto, nullable: true, description: 'null: further diagnosis is not offered' })
  @IsOptional() @IsObject({ message: 'must be an object { hours, description } or null' }) @ValidateNested() @Type(() => EscalationEditDto) escalation?: EscalationEditDto | null;

  @ApiPropertyOptional({ type: [String], description: 'Safety caution keys' })
  @Present() @IsArray({ message: 'must be a list of caution keys' }) @ArrayMaxSize(10) @KnowledgeKey(40, { each: true }) cautions?: string[];
}

export class CodeEditQuery {
  @ApiPropertyOptional({ description: "The make whose meaning to edit (manufacturer-controlled codes); absent = the generic entry" })
  @IsOptional() @IsString() @MaxLength(40) make?: string;
}
