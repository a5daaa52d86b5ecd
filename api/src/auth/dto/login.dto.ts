import { ApiProperty } from '@nestjs/swagger';
import { IsString, Length } from 'class-validator';

/** Email and password of a sign-in. Not checked for format: a wrong email just gets the usual 401. */
export class LoginDto {
  @ApiProperty({ example: 'inspector@demo.test' })
  @IsString()
  @Length(1, 254)
  email: string;

  @ApiProperty({ example: 'siteband-demo-2026' })
  @IsString()
  @Length(1, 1024)
  password: string;
}
