import { ApiExtraModels, ApiProperty, ApiPropertyOptional, getSchemaPath } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsObject, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { FIELD_REPORT_KINDS, FIELD_REPORT_STATUSES, KNOWLEDGE_LIMITS, PART_SYSTEMS, type FieldReportKind, type FieldReportStatus, type PartSystem } from '@causeway/shared';
import { TextLength, Trim } from '../../moderation/dto/validators';
import { ConfirmedFixPayloadDto, CorrectionPayloadDto, NewCausePayloadDto } from './payloads.dto';

@ApiExtraModels(ConfirmedFixPayloadDto, NewCausePayloadDto, CorrectionPayloadDto)
export class FieldReportBody {
  @ApiProperty({ enum: FIELD_REPORT_KINDS })
  @IsIn(FIELD_REPORT_KINDS, { message: `must be one of ${FIELD_REPORT_KINDS.join(', ')}` }) kind: FieldReportKind;

  /** Checked against the kind's rules (`payload.prior`, `payload.code`, …). */
  @ApiProperty({ oneOf: [{ $ref: getSchemaPath(ConfirmedFixPayloadDto) }, { $ref: getSchemaPath(NewCausePayloadDto) }, { $ref: getSchemaPath(CorrectionPayloadDto) }] })
  @IsObject({ message: 'must be an object with the fields of the kind' }) payload: Record<string, unknown>;

  @ApiPropertyOptional({ description: 'true: submit for review at once; otherwise saved as a draft' })
  @IsOptional() @IsBoolean({ message: 'must be true or false' }) submit?: boolean;
}

const toUpper = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim().toUpperCase() : value);

export class MyReportsQuery {
  @ApiPropertyOptional({ enum: FIELD_REPORT_STATUSES })
  @IsOptional() @IsIn(FIELD_REPORT_STATUSES, { message: `must be one of ${FIELD_REPORT_STATUSES.join(', ')}` }) status?: FieldReportStatus;

  @ApiPropertyOptional({ enum: FIELD_REPORT_KINDS })
  @IsOptional() @IsIn(FIELD_REPORT_KINDS, { message: `must be one of ${FIELD_REPORT_KINDS.join(', ')}` }) kind?: FieldReportKind;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
}

const REVIEW_STATUSES = FIELD_REPORT_STATUSES.filter((s) => s !== 'draft');

export class ReviewQueueQuery {
  @ApiPropertyOptional({ enum: REVIEW_STATUSES, default: 'submitted' })
  @IsOptional() @IsIn(REVIEW_STATUSES, { message: `must be one of ${REVIEW_STATUSES.join(', ')}` }) status: FieldReportStatus = 'submitted';

  @ApiPropertyOptional({ enum: FIELD_REPORT_KINDS })
  @IsOptional() @IsIn(FIELD_REPORT_KINDS, { message: `must be one of ${FIELD_REPORT_KINDS.join(', ')}` }) kind?: FieldReportKind;

  @ApiPropertyOptional({ example: 'P0303' })
  @IsOptional() @Transform(toUpper) @IsString() @MaxLength(16) code?: string;

  @ApiPropertyOptional({ description: 'Only reports that propose a new catalogue entry' })
  @IsOptional() @Transform(({ value }) => (value === 'true' ? true : value === 'false' ? false : value)) @IsBoolean({ message: 'must be true or false' }) proposesNewCode?: boolean;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
}

export class ApproveReportDto {
  @ApiPropertyOptional({ description: 'A note for the author and the audit log' })
  @IsOptional() @Trim() @TextLength(0, KNOWLEDGE_LIMITS.reasonMax) note?: string;

  @ApiPropertyOptional({ enum: PART_SYSTEMS, description: 'For a new cause whose new part names no system' })
  @IsOptional() @IsIn(PART_SYSTEMS, { message: `must be one of ${PART_SYSTEMS.join(', ')}` }) partSystem?: PartSystem;
}

export class RejectReportDto {
  @ApiProperty({ description: `${KNOWLEDGE_LIMITS.reasonMin}–${KNOWLEDGE_LIMITS.reasonMax} characters, e-mailed to the author` })
  @Trim() @TextLength(KNOWLEDGE_LIMITS.reasonMin, KNOWLEDGE_LIMITS.reasonMax) reason: string;
}
