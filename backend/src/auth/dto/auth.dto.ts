import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { IsEmail, IsIn, IsInt, IsObject, IsOptional, IsString, Length, Matches, Max, MaxLength, Min, MinLength, Validate, ValidateNested, ValidatorConstraint, type ValidatorConstraintInterface } from 'class-validator';
import { isIsoCurrency, PASSWORD_RULE, passwordMeetsRule } from '@causeway/shared';

@ValidatorConstraint({ name: 'passwordRule' })
export class PasswordRule implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    return typeof value === 'string' && passwordMeetsRule(value);
  }
  defaultMessage(): string {
    return `must be ${PASSWORD_RULE}`;
  }
}

@ValidatorConstraint({ name: 'isoCurrency' })
export class IsoCurrencyRule implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    return typeof value === 'string' && isIsoCurrency(value);
  }
  defaultMessage(): string {
    return 'must be an ISO 4217 currency code such as GBP or EUR';
  }
}

@ValidatorConstraint({ name: 'locale' })
export class LocaleRule implements ValidatorConstraintInterface {
  validate(value: unknown): boolean {
    if (typeof value !== 'string') return false;
    try {
      return Intl.NumberFormat.supportedLocalesOf([value]).length === 1;
    } catch {
      return false;
    }
  }
  defaultMessage(): string {
    return 'must be a supported locale such as en-GB or de-DE';
  }
}

const trim = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);

export class ShopSettingsDto {
  @ApiProperty({ example: 'Kestrel Lane Garage' })
  @Transform(trim)
  @IsString()
  @Length(2, 120)
  name: string;

  @ApiProperty({ example: 'GBP' })
  @IsString()
  @Validate(IsoCurrencyRule)
  currency: string;

  @ApiProperty({ example: 'en-GB' })
  @IsString()
  @MaxLength(35)
  @Validate(LocaleRule)
  locale: string;

  @ApiProperty({ example: 9500, description: 'Labour per hour before tax, integer minor units' })
  @IsInt()
  @Min(0)
  @Max(10_000_000)
  labourRateMinor: number;

  @ApiProperty({ example: 2000, description: 'Sales tax in basis points (2000 = 20 %)' })
  @IsInt()
  @Min(0)
  @Max(10_000)
  taxRateBp: number;

  @ApiProperty({ enum: ['km', 'mi'] })
  @IsIn(['km', 'mi'])
  distanceUnit: 'km' | 'mi';
}

export class RegisterDto {
  @ApiProperty({ example: 'sam@example.com' })
  @Transform(trim)
  @IsEmail({}, { message: 'must be an e-mail address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ description: PASSWORD_RULE })
  @IsString()
  @MaxLength(128)
  @Validate(PasswordRule)
  password: string;

  @ApiProperty({ example: 'Sam Okafor' })
  @Transform(trim)
  @IsString()
  @Length(1, 80)
  displayName: string;

  @ApiPropertyOptional({ description: 'Join an existing shop with the invite code its owner made' })
  @IsOptional()
  @Transform(trim)
  @IsString()
  @Matches(/^[A-Z0-9-]{6,32}$/i, { message: 'must be the invite code as given (letters, digits and dashes)' })
  inviteCode?: string;

  @ApiPropertyOptional({ type: ShopSettingsDto, description: 'Create a new shop, of which the new user is the owner' })
  @IsOptional()
  // ValidateNested alone lets an array through (its items are validated instead): a 500 later.
  @IsObject({ message: "must be an object with the new shop's settings" })
  @ValidateNested()
  @Type(() => ShopSettingsDto)
  shop?: ShopSettingsDto;
}

export class LoginDto {
  @ApiProperty()
  @Transform(trim)
  @IsString()
  @MaxLength(254)
  email: string;

  @ApiProperty()
  @IsString()
  @MinLength(1)
  @MaxLength(128)
  password: string;
}

export class ChangePasswordDto {
  @ApiProperty()
  @IsString()
  @MaxLength(128)
  currentPassword: string;

  @ApiProperty({ description: PASSWORD_RULE })
  @IsString()
  @MaxLength(128)
  @Validate(PasswordRule)
  newPassword: string;
}
