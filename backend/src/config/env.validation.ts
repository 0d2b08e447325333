import { plainToInstance } from 'class-transformer';
import { IsBooleanString, IsIn, IsInt, IsOptional, IsString, Max, Min, MinLength, validateSync } from 'class-validator';

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
  @IsOptional() @IsInt() @Min(1) PRIOR_STRENGTH?: number;
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
