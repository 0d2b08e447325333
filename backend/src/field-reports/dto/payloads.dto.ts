import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsObject, IsOptional, IsString, MaxLength, ValidateBy, ValidateNested, type ValidationArguments } from 'class-validator';
import { KNOWLEDGE_LIMITS, PART_SYSTEMS, type CorrectionField, type PartSystem } from '@causeway/shared';
import { CheckDto, ScopeDto } from '../../moderation/dto/knowledge-edit.dto';
import { IsoCurrency, KnowledgeKey, ModelYear, NumberBetween, TextLength, Trim, TrimToNull } from '../../moderation/dto/validators';

const L = KNOWLEDGE_LIMITS;

/** What a confirmed fix says: the vehicle, the part that fixed it and the evidence. */
export class ConfirmedFixPayloadDto {
  @ApiProperty({ example: 'P0303' })
  @IsString({ message: 'is required: a fault code such as P0303' }) @MaxLength(16) code: string;

  @ApiProperty({ example: 'Morrow' })
  @Trim() @TextLength(1, 40) make: string;

  @ApiProperty({ example: 'Strand' })
  @Trim() @TextLength(1, 60) model: string;

  @ApiPropertyOptional({ nullable: true, example: '3.0 V6' })
  @IsOptional() @TrimToNull() @TextLength(1, 60) engine?: string | null;

  @ApiPropertyOptional({ nullable: true, example: 2018 })
  @IsOptional() @ModelYear() year?: number | null;

  @ApiProperty({ example: 'ignition-coil', description: 'Key of the part whose replacement fixed it' })
  @KnowledgeKey(60) part: string;

  @ApiPropertyOptional({ nullable: true, example: 88400, description: 'Odometer in km' })
  @IsOptional() @NumberBetween(0, L.odometerKmMax) odometerKm?: number | null;

  @ApiPropertyOptional({ type: [String], example: ['spark-plug'], description: 'Part keys tried first without success' })
  @IsOptional() @IsArray({ message: 'must be a list of part keys' }) @ArrayMaxSize(20) @KnowledgeKey(60, { each: true }) triedFirst?: string[];

  @ApiPropertyOptional()
  @IsOptional() @Trim() @TextLength(0, L.notesMax) notes?: string;

  @ApiPropertyOptional({ nullable: true, description: 'A title for a valid code that is not in the catalogue' })
  @IsOptional() @TrimToNull() @TextLength(3, 200) codeTitle?: string | null;
}

/** A possible cause proposed for a code and scope, with its costs and check. */
export class NewCausePayloadDto extends ScopeDto {
  @ApiProperty({ example: 'P0171' })
  @IsString({ message: 'is required: a fault code such as P0171' }) @MaxLength(16) code: string;

  @ApiProperty({ example: 'turbo-diverter-valve', description: 'An existing part key, or a new one with partName and system' })
  @KnowledgeKey(60) part: string;

  @ApiPropertyOptional({ nullable: true, example: 'Turbo diverter valve (split diaphragm)' })
  @IsOptional() @TrimToNull() @TextLength(1, 160) partName?: string | null;

  @ApiPropertyOptional({ enum: PART_SYSTEMS, nullable: true })
  @IsOptional() @IsIn(PART_SYSTEMS, { message: `must be one of ${PART_SYSTEMS.join(', ')}` }) system?: PartSystem | null;

  @ApiProperty({ example: 0.05, description: 'Proposed prior weight, 0–1' })
  @NumberBetween(0, 1) prior: number;

  @ApiProperty({ example: 6800, description: 'Part price in integer minor units of `currency`' })
  @NumberBetween(0, L.partCostMinorMax, { integer: true }) partCostMinor: number;

  @ApiProperty({ example: 'GBP' })
  @IsoCurrency() currency: string;

  @ApiProperty({ example: 0.6 })
  @NumberBetween(0, L.hoursMax) replaceHours: number;

  @ApiPropertyOptional({ nullable: true, description: 'Teardown key' })
  @IsOptional() @KnowledgeKey(80) teardown?: string | null;

  @ApiPropertyOptional({ type: CheckDto, nullable: true })
  @IsOptional() @IsObject({ message: 'must be an object { description, hours, mustPrecede } or null' }) @ValidateNested() @Type(() => CheckDto) check?: CheckDto | null;

  @ApiPropertyOptional()
  @IsOptional() @Trim() @TextLength(0, L.notesMax) notes?: string;

  @ApiPropertyOptional({ nullable: true })
  @IsOptional() @TrimToNull() @TextLength(3, 200) codeTitle?: string | null;
}

export const CORRECTION_FIELDS: readonly CorrectionField[] = ['partCostMinor', 'replaceHours', 'title', 'description'];

/** The value rule of each correctable field. */
const VALUE_RULES: Record<CorrectionField, { ok: (v: unknown) => boolean; message: string }> = {
  partCostMinor: { ok: (v) => typeof v === 'number' && Number.isInteger(v) && v >= 0 && v <= L.partCostMinorMax, message: `must be a whole number between 0 and ${L.partCostMinorMax} (minor units of the cause's currency)` },
  replaceHours: { ok: (v) => typeof v === 'number' && Number.isFinite(v) && v >= 0 && v <= L.hoursMax, message: `must be a number of hours between 0 and ${L.hoursMax}` },
  title: { ok: (v) => typeof v === 'string' && v.trim().length >= 1 && v.length <= 200, message: 'must be text of 1 to 200 characters' },
  description: { ok: (v) => typeof v === 'string' && v.length <= 4000, message: 'must be text of at most 4000 characters' },
};

function CorrectionValue(): PropertyDecorator {
  return ValidateBy({
    name: 'correctionValue',
    validator: {
      validate: (v: unknown, args?: ValidationArguments) => {
        const rule = VALUE_RULES[(args?.object as { field?: CorrectionField }).field as CorrectionField];
        return rule ? rule.ok(v) : v !== undefined;
      },
      defaultMessage: (args?: ValidationArguments) => VALUE_RULES[(args?.object as { field?: CorrectionField }).field as CorrectionField]?.message ?? 'is required',
    },
  });
}

/** A correction of a cause's part cost or labour hours, or of a code's title or description. */
export class CorrectionPayloadDto extends ScopeDto {
  @ApiProperty({ enum: ['cause', 'code'] })
  @IsIn(['cause', 'code'], { message: 'must be cause or code' }) target: 'cause' | 'code';

  @ApiProperty({ example: 'P0456' })
  @IsString({ message: 'is required: a fault code such as P0456' }) @MaxLength(16) code: string;

  @ApiPropertyOptional({ nullable: true, example: 'fuel-cap', description: 'With target cause: the part key of the cause' })
  @IsOptional() @KnowledgeKey(60) part?: string | null;

  @ApiProperty({ enum: CORRECTION_FIELDS })
  @IsIn(CORRECTION_FIELDS, { message: `must be one of ${CORRECTION_FIELDS.join(', ')}` }) field: CorrectionField;

  @ApiProperty({ oneOf: [{ type: 'number' }, { type: 'string' }], example: 2600 })
  @CorrectionValue() value: number | string;

  @ApiProperty({ example: 'Supplier price rose (invoice attached)' })
  @Trim() @TextLength(L.reasonMin, L.reasonMax) reason: string;
}

export const PAYLOAD_CLASSES = {
  'confirmed-fix': ConfirmedFixPayloadDto,
  'new-cause': NewCausePayloadDto,
  correction: CorrectionPayloadDto,
} as const;
