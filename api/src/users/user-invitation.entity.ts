import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { User } from './user.entity';

/** A single-use set-password link sent to an invited user; only the SHA-256 of its token is stored. */
@Entity({ name: 'user_invitations' })
@Index('UQ_user_invitations_tokenHash', ['tokenHash'], { unique: true })
@Index('IDX_user_invitations_userId', ['userId'])
export class UserInvitation {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_user_invitations_user' })
  user?: User;

  /** Lower-case hex SHA-256 of the token in the link. */
  @Column({ type: 'char', length: 64 })
  tokenHash: string;

  @Column({ type: 'datetime', precision: 3 })
  expiresAt: Date;

  @Column({ type: 'datetime', precision: 3, nullable: true })
  usedAt: Date | null;

  @Column({ type: 'uuid' })
  invitedBy: string;

  @CreateDateColumn({ type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
