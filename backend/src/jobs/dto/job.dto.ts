import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import {
  ArrayMaxSize,
  ArrayMinSize,
  IsArray,
  IsBoolean,
  IsIn,
  IsInt,
  IsISO8601,
  IsNotEmpty,
  IsNumber,
  IsObject,
  IsOptional,
  IsString,
  IsUUID,
  Matches,
  Max,
  MaxLength,
  Min,
  ValidateNested,
} from 'class-validator';
import {
  CODE_STATUSES,
  JOB_SORTS,
  type CloseJobRequest,
  type CodeStatus,
  type CreateJobRequest,
  type CreateStepRequest,
  type FreezeFrame,
  type JobCodeInput,
  type JobResolution,
  type JobSort,
  type JobStatus,
  type StepKind,
  type StepResult,
} from '@causeway/shared';
import { MAX_ODOMETER, OneDecimalAtMost } from '../../vehicles/dto/vehicle.dto';

const trimmed = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

/** Most money a single step may record, in minor units (a sanity bound, not a business rule). */
export const MAX_STEP_COST_MINOR = 100_000_000;
const PART_KEY = /^[a-z0-9][a-z0-9-]{0,59}$/;
const PART_KEY_MESSAGE = 'must be part keys: lower-case letters, digits and dashes, such as fuel-cap';

export class JobCodeInputDto implements JobCodeInput {
  @ApiProperty({ example: 'P0171', description: 'As read: P0171, po171, 01 71, P0171-13' })
  @IsString() @MaxLength(24)
  code: string;

  @ApiProperty({ enum: CODE_STATUSES })
  @IsIn(CODE_STATUSES, { message: `must be one of ${CODE_STATUSES.join(', ')}` })
  status: CodeStatus;

  @ApiPropertyOptional({ example: { 'RPM': 780, 'LTFT B1 %': 24.2 }, description: 'Freeze-frame name (with unit) → value' })
  @IsOptional() @IsObject()
  freezeFrame?: FreezeFrame;
}

export class CreateJobDto implements CreateJobRequest {
  @ApiProperty() @IsString() @IsNotEmpty({ message: 'is required' })
  vehicleId: string;

  @ApiProperty({ example: 'Engine warning lamp on; rough idle' })
  @trimmed() @IsString() @IsNotEmpty({ message: 'is required: what the customer reported' }) @MaxLength(2000)
  complaint: string;

  @ApiProperty({ type: [JobCodeInputDto] })
  @IsArray() @ArrayMinSize(1, { message: 'needs at least one fault code' }) @ArrayMaxSize(20) @IsObject({ each: true, message: 'each must be an object { code, status, freezeFrame? }' }) @ValidateNested({ each: true }) @Type(() => JobCodeInputDto)
  codes: JobCodeInputDto[];

  @ApiPropertyOptional({ description: 'A member of the shop; the caller when absent' })
  @IsOptional() @IsString()
  technicianId?: string;

  @ApiPropertyOptional({ description: "Odometer in the shop's unit; updates the vehicle's reading" })
  @IsOptional() @IsNumber({ allowNaN: false, allowInfinity: false }) @OneDecimalAtMost() @Min(0) @Max(MAX_ODOMETER)
  odometer?: number;

  @ApiPropertyOptional() @IsOptional() @IsBoolean()
  confirmOdometerLower?: boolean;

  @ApiPropertyOptional({ description: 'ISO 8601; now when absent' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date-time' })
  openedAt?: string;
}

export class CreateStepDto implements CreateStepRequest {
  @ApiPropertyOptional({ description: "The job's code the step works on; may be left out when the job has one code" })
  @IsOptional() @IsString() @MaxLength(24)
  code?: string;

  @ApiProperty({ enum: ['check', 'replace'] })
  @IsIn(['check', 'replace'], { message: 'must be check or replace' })
  kind: StepKind;

  @ApiProperty({ example: ['pcv-diaphragm'], description: 'check: one part key; replace: the parts replaced together' })
  @IsArray() @ArrayMinSize(1, { message: 'needs at least one part key' }) @ArrayMaxSize(10) @IsString({ each: true }) @Matches(PART_KEY, { each: true, message: PART_KEY_MESSAGE })
  parts: string[];

  @ApiProperty({ enum: ['at-fault', 'not-at-fault', 'cleared', 'came-back'] })
  @IsIn(['at-fault', 'not-at-fault', 'cleared', 'came-back'], { message: 'must be at-fault or not-at-fault (check), cleared or came-back (replace)' })
  result: StepResult;

  @ApiProperty({ example: 11150, description: "Pre-tax, integer minor units of the shop's currency" })
  @IsInt({ message: 'must be a whole number of minor units (pence, cents)' }) @Min(0) @Max(MAX_STEP_COST_MINOR)
  actualCostMinor: number;

  @ApiPropertyOptional() @IsOptional() @trimmed() @IsString() @MaxLength(4000)
  notes?: string;

  @ApiPropertyOptional({ description: 'ISO 8601; now when absent' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date-time' })
  at?: string;
}

export class FixedByDto {
  @ApiProperty({ example: 'P0171' }) @IsString() @MaxLength(24)
  code: string;

  @ApiProperty({ example: ['pcv-diaphragm'], description: '[] = a cause not listed' })
  @IsArray() @ArrayMaxSize(10) @IsString({ each: true }) @Matches(PART_KEY, { each: true, message: PART_KEY_MESSAGE })
  parts: string[];
}

export class CloseJobDto implements CloseJobRequest {
  @ApiProperty({ enum: ['resolved', 'unresolved'] })
  @IsIn(['resolved', 'unresolved'], { message: 'must be resolved or unresolved' })
  resolution: JobResolution;

  @ApiPropertyOptional({ description: 'Must be true to close as resolved: the code stayed away after the verification drive' })
  @IsOptional() @IsBoolean()
  verificationPassed?: boolean;

  @ApiPropertyOptional({ type: [FixedByDto], description: "What fixed each code; by default each code's last clearing replacement" })
  // IsObject each: ValidateNested alone lets an array item through unchecked (a 500 later).
  @IsOptional() @IsArray() @ArrayMaxSize(20) @IsObject({ each: true, message: 'each must be an object { code, parts }' }) @ValidateNested({ each: true }) @Type(() => FixedByDto)
  fixedBy?: FixedByDto[];

  @ApiPropertyOptional() @IsOptional() @trimmed() @IsString() @MaxLength(4000)
  notes?: string;
}

export class JobListQueryDto {
  @ApiPropertyOptional({ enum: ['open', 'closed'] }) @IsOptional() @IsIn(['open', 'closed'], { message: 'must be open or closed' })
  status?: JobStatus;

  @ApiPropertyOptional({ example: 'P0171' }) @IsOptional() @IsString() @MaxLength(24)
  code?: string;

  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be a vehicle id' })
  vehicleId?: string;

  @ApiPropertyOptional() @IsOptional() @IsUUID('all', { message: 'must be a user id' })
  technicianId?: string;

  @ApiPropertyOptional({ description: 'Opened on or after (ISO date or date-time)' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' })
  from?: string;

  @ApiPropertyOptional({ description: 'Opened on or before (a date alone means the whole day)' })
  @IsOptional() @IsISO8601({ strict: true }, { message: 'must be an ISO 8601 date or date-time' })
  to?: string;

  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
  @ApiPropertyOptional({ enum: JOB_SORTS }) @IsOptional() @IsIn(JOB_SORTS, { message: `must be one of ${JOB_SORTS.join(', ')}` }) sort: JobSort = 'openedAt';
  @ApiPropertyOptional({ enum: ['asc', 'desc'] }) @IsOptional() @IsIn(['asc', 'desc']) order: 'asc' | 'desc' = 'desc';
}
