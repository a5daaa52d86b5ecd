import { ApiProperty } from '@nestjs/swagger';
import { ROLES, type Role } from '@siteband/shared';
import type { User } from '../user.entity';

/** Who a signed-in person is: returned at sign-in and by GET /api/me. */
export class UserSummaryDto {
  @ApiProperty({ format: 'uuid' })
  id: string;

  @ApiProperty({ example: 'inspector@demo.test' })
  email: string;

  @ApiProperty({ example: 'Rowan Ashdown' })
  displayName: string;

  @ApiProperty({ enum: ROLES })
  role: Role;

  /** The public fields of a user entity (never its password hash). */
  static fromEntity(user: User): UserSummaryDto {
    return Object.assign(new UserSummaryDto(), {
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      role: user.role,
    });
  }
}

/** A user as administrators see it. */
export class UserDto extends UserSummaryDto {
  @ApiProperty()
  active: boolean;

  @ApiProperty({ type: String, format: 'date-time' })
  createdAt: string;

  @ApiProperty({ type: String, format: 'date-time' })
  updatedAt: string;

  static override fromEntity(user: User): UserDto {
    return Object.assign(new UserDto(), UserSummaryDto.fromEntity(user), {
      active: user.active,
      createdAt: user.createdAt.toISOString(),
      updatedAt: user.updatedAt.toISOString(),
    });
  }
}
