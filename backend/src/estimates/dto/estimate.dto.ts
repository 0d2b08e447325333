import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import type { CreateEstimateRequest, EstimateAnswerRequest } from '@causeway/shared';

const trimmedOrUndefined = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() || undefined : value));

export class CreateEstimateDto implements CreateEstimateRequest {
  @ApiPropertyOptional({ minimum: 1, maximum: 90, description: 'Days until the link expires (default ESTIMATE_EXPIRY_DAYS, else 14)' })
  @IsOptional() @IsInt({ message: 'must be a whole number of days' }) @Min(1) @Max(90)
  expiresInDays?: number;

  @ApiPropertyOptional({ description: "Send to this address instead of the vehicle owner's" })
  @IsOptional() @trimmedOrUndefined() @IsEmail({}, { message: 'must be an e-mail address' }) @MaxLength(254)
  recipientEmail?: string;

  @ApiPropertyOptional({ description: 'A few words from the shop, shown above the stages' })
  @IsOptional() @trimmedOrUndefined() @IsString() @MaxLength(2000)
  message?: string;
}

export class ResendEstimateDto {
  @ApiPropertyOptional({ minimum: 1, maximum: 90 })
  @IsOptional() @IsInt({ message: 'must be a whole number of days' }) @Min(1) @Max(90)
  expiresInDays?: number;

  @ApiPropertyOptional()
  @IsOptional() @trimmedOrUndefined() @IsEmail({}, { message: 'must be an e-mail address' }) @MaxLength(254)
  recipientEmail?: string;
}

export class EstimateAnswerDto implements EstimateAnswerRequest {
  @ApiProperty({ example: 0, description: '0-based index of the stage' })
  @IsInt({ message: 'must be the whole-number index of a stage' }) @Min(0)
  stageIndex: number;

  @ApiProperty({ enum: ['approved', 'declined'] })
  @IsIn(['approved', 'declined'], { message: 'must be approved or declined' })
  decision: 'approved' | 'declined';

  @ApiPropertyOptional({ description: 'Who answers, as they wish to be named' })
  @IsOptional() @trimmedOrUndefined() @IsString() @MaxLength(120)
  name?: string;
}
