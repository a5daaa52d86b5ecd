import { ApiPropertyOptional } from '@nestjs/swagger';
import { ROLES, type Role } from '@siteband/shared';
import { Transform } from 'class-transformer';
import { IsBoolean, IsIn, IsOptional, IsString, Length } from 'class-validator';

/** An administrator renames a user, changes their role, or (de)activates them. */
export class UpdateUserDto {
  @ApiPropertyOptional({ minLength: 1, maxLength: 120 })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString()
  @Length(1, 120)
  displayName?: string;

  @ApiPropertyOptional({ enum: ROLES })
  @IsOptional()
  @IsIn(ROLES, { message: `role must be one of ${ROLES.join(', ')}` })
  role?: Role;

  @ApiPropertyOptional({ description: 'false deactivates: sign-in, refresh and existing access tokens stop working' })
  @IsOptional()
  @IsBoolean()
  active?: boolean;
}
