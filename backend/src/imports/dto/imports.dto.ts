import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsBoolean, IsIn, IsInt, IsNotEmpty, IsObject, IsOptional, IsString, IsUUID, Max, MaxLength, Min } from 'class-validator';
import { IMPORT_STATUSES, type ImportMappingInput, type ImportStatus } from '@causeway/shared';

/** 'true' / 'false' (or a boolean) only: anything else stays as given and fails @IsBoolean. */
const strictBoolean = ({ value }: { value: unknown }) => (value === 'true' ? true : value === 'false' ? false : value);

export class ImportUploadQuery {
  @ApiPropertyOptional({ default: true, description: 'true: check, preview and rehearse only; false: commit' })
  @IsOptional() @Transform(strictBoolean) @IsBoolean({ message: 'must be true or false' }) dryRun = true;

  @ApiPropertyOptional({ default: false, description: 'true: import the valid rows and skip the rejected ones; false: a file with any rejected row is refused whole' })
  @IsOptional() @Transform(strictBoolean) @IsBoolean({ message: 'must be true or false' }) validOnly = false;

  @ApiPropertyOptional({ description: 'A UUID the client chooses for the import, so that it can poll GET /api/imports/:id while the commit runs' })
  @IsOptional() @IsUUID('4', { message: 'must be a version 4 UUID' }) id?: string;
}

export class ImportUploadBody {
  @ApiPropertyOptional({ description: 'JSON of a mapping (ImportMappingInput), applied over the detected one and any saved mapping' })
  @IsOptional() @IsString() @MaxLength(64 * 1024) mapping?: string;

  @ApiPropertyOptional({ description: 'The name of a mapping saved for the shop' })
  @IsOptional() @IsString() @MaxLength(80) mappingName?: string;
}

export class ImportListQueryDto {
  @ApiPropertyOptional({ enum: IMPORT_STATUSES }) @IsOptional() @IsIn(IMPORT_STATUSES, { message: `must be one of ${IMPORT_STATUSES.join(', ')}` }) status?: ImportStatus;
  @ApiPropertyOptional({ default: 1 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100000) page = 1;
  @ApiPropertyOptional({ default: 25, maximum: 100 }) @IsOptional() @Type(() => Number) @IsInt() @Min(1) @Max(100) pageSize = 25;
}

export class SaveImportMappingDto {
  @ApiProperty({ example: 'Workshop reader export', description: 'Unique in the shop; an existing name is replaced' })
  @IsString() @IsNotEmpty({ message: 'is required' }) @MaxLength(80) @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value)) name: string;

  @ApiProperty({ example: { columns: { code: 'DTC', date: 'Read at' }, odometerUnit: 'mi' }, description: 'columns (field → header), freezeFrame [{header, key}], odometerUnit, dateOrder, statusValues' })
  @IsObject({ message: 'must be an object' }) mapping: ImportMappingInput;
}
