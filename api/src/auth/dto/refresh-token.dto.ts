import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';

/** A refresh token, for POST /api/auth/refresh and POST /api/auth/logout. */
export class RefreshTokenDto {
  @ApiProperty({ description: 'The refresh token from the last sign-in or refresh' })
  @IsString()
  @Length(1, 512)
  refreshToken: string;
}
