import { ApiProperty } from '@nestjs/swagger';
import { UserSummaryDto } from '../../users/dto/user.dto';

/** Tokens handed out at sign-in and at each refresh. */
export class AuthResponseDto {
  @ApiProperty({ description: 'JWT for `Authorization: Bearer ...`' })
  accessToken: string;

  @ApiProperty({ description: 'Opaque; single use: each refresh returns a new one and revokes this one' })
  refreshToken: string;

  @ApiProperty({ description: 'Seconds until the access token expires', example: 900 })
  accessTokenExpiresIn: number;

  @ApiProperty({ type: UserSummaryDto })
  user: UserSummaryDto;
}
