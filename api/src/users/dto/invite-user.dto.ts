import { ApiProperty, OmitType } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';
import { MAX_PASSWORD_BYTES, MIN_PASSWORD_LENGTH } from '@siteband/shared';
import { CreateUserDto } from './create-user.dto';
import { IsPassword } from './is-password.decorator';

/** An administrator invites someone by e-mail: they set their own password through the link. */
export class InviteUserDto extends OmitType(CreateUserDto, ['password'] as const) {}

/** `POST /api/auth/set-password`: the token from the invitation link and the new password. */
export class SetPasswordDto {
  @ApiProperty({ description: 'The token from the set-password link' })
  @IsString()
  @Length(20, 200)
  token: string;

  @ApiProperty({ minLength: MIN_PASSWORD_LENGTH, description: `${MIN_PASSWORD_LENGTH} characters to ${MAX_PASSWORD_BYTES} bytes` })
  @IsPassword()
  password: string;
}
