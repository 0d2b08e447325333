import { plainToInstance } from 'class-transformer';
import { IsBooleanString, IsIn, IsInt, IsOptional, IsString, IsUrl, Matches, Max, Min, MinLength, ValidateIf, validateSync } from 'class-validator';

/** The environment the server accepts; anything wrong stops the boot with the variable named. */
class EnvironmentVariables {
  @IsOptional() @IsInt() @Min(0) @Max(65535) PORT?: number;
  @IsOptional() @IsString() DATA_DIR?: string;
  @IsOptional() @IsString() @MinLength(32) JWT_SECRET?: string;
  @IsOptional() @IsInt() @Min(60) JWT_TTL_SECONDS?: number;
  @IsOptional() @IsInt() @Min(4) @Max(15) BCRYPT_ROUNDS?: number;
  @IsOptional() @IsString() SMTP_HOST?: string;
  @IsOptional() @IsInt() @Min(1) @Max(65535) SMTP_PORT?: number;
  @IsOptional() @IsBooleanString() SEED_DEMO?: string;
  @IsOptional() @IsIn(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']) LOG_LEVEL?: string;
  @IsOptional() @IsInt() @Min(1) AUTH_THROTTLE_LIMIT?: number;
  @IsOptional() @IsInt() @Min(1) THROTTLE_LIMIT?: number;
  @IsOptional() @IsInt() @Min(1) SIGN_IN_MAX_FAILURES?: number;
  @IsOptional() @IsInt() @Min(1) SIGN_IN_WINDOW_SECONDS?: number;
  @IsOptional() @IsInt() @Min(1) PRIOR_STRENGTH?: number;
  // Several instances (README "Running several instances"): PostgreSQL, shared uploads, shared throttling.
  @IsOptional() @Matches(/^postgres(ql)?:\/\//, { message: 'must be a postgres:// or postgresql:// URL' }) DATABASE_URL?: string;
  @IsOptional() @IsInt() @Min(1) @Max(1000) PG_POOL_MAX?: number;
  @IsOptional() @IsIn(['database', 'memory']) THROTTLE_STORAGE?: string;
  @IsOptional() @IsIn(['local', 's3']) STORAGE_DRIVER?: string;
  @ValidateIf((e: EnvironmentVariables) => e.STORAGE_DRIVER === 's3') @IsString() @MinLength(3, { message: 'must name the bucket when STORAGE_DRIVER=s3' }) S3_BUCKET?: string;
  @IsOptional() @IsUrl({ require_tld: false, require_protocol: true, protocols: ['http', 'https'] }) S3_ENDPOINT?: string;
  @IsOptional() @IsBooleanString() S3_FORCE_PATH_STYLE?: string;
}

export function validateEnv(config: Record<string, unknown>): Record<string, unknown> {
  const validated = plainToInstance(EnvironmentVariables, config, { enableImplicitConversion: true });
  const errors = validateSync(validated, { skipMissingProperties: false });
  if (errors.length > 0) {
    const lines = errors.map((e) => `${e.property}: ${Object.values(e.constraints ?? {}).join('; ')}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  return config;
}
