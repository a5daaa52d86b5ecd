import { ApiProperty } from '@nestjs/swagger';
import { MAX_PASSWORD_BYTES, MIN_PASSWORD_LENGTH, ROLES, type Role } from '@siteband/shared';
import { Transform } from 'class-transformer';
import { IsEmail, IsIn, IsString, Length, MaxLength } from 'class-validator';
import { normalizeEmail } from '../email';
import { IsPassword } from './is-password.decorator';

/** An administrator adds a user. */
export class CreateUserDto {
  @ApiProperty({ example: 'new.inspector@demo.test', maxLength: 254 })
  @Transform(({ value }) => (typeof value === 'string' ? normalizeEmail(value) : value))
  @IsEmail({}, { message: 'email must be an email address' })
  @MaxLength(254)
  email: string;

  @ApiProperty({ example: 'Sasha Kerrigan-Hale', minLength: 1, maxLength: 120 })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @Length(1, 120)
  displayName: string;

  @ApiProperty({ enum: ROLES })
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role: Role;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH, description: `${MIN_PASSWORD_LENGTH} characters to ${MAX_PASSWORD_BYTES} bytes` })
  @IsPassword()
  password: string;
}
