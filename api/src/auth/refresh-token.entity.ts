import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from '../users/user.entity';

/**
 * One refresh token. Only its SHA-256 is stored. Every refresh replaces the token with a new one of the
 * same family (one sign-in = one family); presenting a revoked token again revokes the whole family.
 */
@Entity({ name: 'refresh_tokens' })
@Index('UQ_refresh_tokens_tokenHash', ['tokenHash'], { unique: true })
@Index('IDX_refresh_tokens_familyId', ['familyId'])
export class RefreshToken {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_refresh_tokens_user' })
  user?: User;

  /** Hex SHA-256 of the random 256-bit token the client holds. */
  @Column({ type: 'char', length: 64 })
  tokenHash: string;

  @Column({ type: 'uuid' })
  familyId: string;

  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  revokedAt: Date | null;

  /** Id of the token that replaced this one at a refresh. */
  @Column({ type: 'uuid', nullable: true })
  replacedBy: string | null;

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
