import { createHash, randomBytes } from 'node:crypto';
import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, QueryFailedError, type Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';
import { enqueueMails } from '../mail/mail-outbox';
import type { CreateUserDto } from './dto/create-user.dto';
import type { InviteUserDto } from './dto/invite-user.dto';
import type { UpdateUserDto } from './dto/update-user.dto';
import { normalizeEmail } from './email';
import { PasswordService } from './password.service';
import { UserInvitation } from './user-invitation.entity';
import { User } from './user.entity';

/** Said for an unknown, used or expired link alike, so the answer tells a guesser nothing. */
export const INVITATION_NOT_VALID = 'This set-password link is not valid (used, expired or unknown): ask an administrator for a new invitation';

/** Reads and changes users; the only place that writes the users table. */
@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly passwords: PasswordService,
    private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    @InjectConfig() private readonly config: AppConfig,
  ) {}

  /** The user with this id, or null. */
  findById(id: string): Promise<User | null> {
    return this.users.findOneBy({ id });
  }

  /** The user with this email (any case), or null. */
  findByEmail(email: string): Promise<User | null> {
    return this.users.findOneBy({ email: normalizeEmail(email) });
  }

  /** Every user, by display name. */
  list(): Promise<User[]> {
    return this.users.find({ order: { displayName: 'ASC', email: 'ASC' } });
  }

  /** Adds a user (audited); 409 when the email is taken. */
  async create(dto: CreateUserDto, actingUser: AuthenticatedUser): Promise<User> {
    const email = normalizeEmail(dto.email);
    if (await this.users.existsBy({ email })) throw emailTaken();
    const user = this.users.create({
      email,
      displayName: dto.displayName,
      role: dto.role,
      passwordHash: await this.passwords.hash(dto.password),
      active: true,
    });
    try {
      return await this.dataSource.transaction(async (manager) => {
        const saved = await manager.save(user);
        await this.audit.record(manager, auditOf(actingUser, saved, 'create', null));
        return saved;
      });
    } catch (error) {
      // Two requests for the same email at once: the unique index decides.
      if (isDuplicateKey(error)) throw emailTaken();
      throw error;
    }
  }

  /**
   * Adds a user without a password and mails them a single-use set-password link (through the mail
   * outbox, in the same transaction, audited); 409 when the email is taken.
   */
  async invite(dto: InviteUserDto, actingUser: AuthenticatedUser): Promise<User> {
    const email = normalizeEmail(dto.email);
    if (await this.users.existsBy({ email })) throw emailTaken();
    const token = randomBytes(32).toString('base64url');
    try {
      return await this.dataSource.transaction(async (manager) => {
        const saved = await manager.save(this.users.create({ email, displayName: dto.displayName, role: dto.role, passwordHash: null, active: true }));
        const expiresAt = new Date(Date.now() + this.config.invite.ttlSeconds * 1000);
        await manager.insert(UserInvitation, { userId: saved.id, tokenHash: tokenHash(token), expiresAt, usedAt: null, invitedBy: actingUser.id });
        const link = `${this.config.mail.publicUrl}/set-password?token=${token}`;
        await enqueueMails(manager, [
          {
            kind: 'user.invitation',
            refId: saved.id,
            to: email,
            subject: 'Your Siteband account: set your password',
            text: [
              `Hello ${dto.displayName},`,
              '',
              `${actingUser.displayName} added you to Siteband. Set your password with this link (once, before ${expiresAt.toISOString()}):`,
              link,
              '',
              'If you did not expect this mail, ignore it: without the password nobody can use the account.',
            ].join('\n'),
            sensitive: true,
          },
        ]);
        await this.audit.record(manager, auditOf(actingUser, saved, 'invite', null));
        return saved;
      });
    } catch (error) {
      if (isDuplicateKey(error)) throw emailTaken();
      throw error;
    }
  }

  /** Sets the password of an invited user from their link's token: once, before it expires, for an active account. */
  async setPasswordFromInvitation(token: string, password: string): Promise<void> {
    const passwordHash = await this.passwords.hash(password);
    await this.dataSource.transaction(async (manager) => {
      // Locked: two requests with the same token cannot both use it.
      const invitation = await manager.findOne(UserInvitation, { where: { tokenHash: tokenHash(token) }, lock: { mode: 'pessimistic_write' } });
      if (!invitation || invitation.usedAt || invitation.expiresAt.getTime() <= Date.now()) throw new BadRequestException(INVITATION_NOT_VALID);
      const user = await manager.findOneBy(User, { id: invitation.userId });
      if (!user || !user.active) throw new BadRequestException(INVITATION_NOT_VALID);
      await manager.update(UserInvitation, { id: invitation.id }, { usedAt: new Date() });
      await manager.update(User, { id: user.id }, { passwordHash });
      await this.audit.record(manager, { actorId: user.id, actorRole: user.role, entity: 'user', entityId: user.id, action: 'set_password', before: null, after: auditedFields(user) });
    });
  }

  /**
   * Changes a user's name, role or active flag. An administrator cannot deactivate themselves or take
   * away their own admin role, so the last administrator cannot lock everyone out by accident.
   */
  async update(id: string, dto: UpdateUserDto, actingUser: AuthenticatedUser): Promise<User> {
    const user = await this.findById(id);
    if (!user) throw new NotFoundException(`No user has the id ${id}`);
    if (id === actingUser.id && (dto.active === false || (dto.role !== undefined && dto.role !== 'admin'))) {
      throw new ConflictException('You cannot deactivate your own account or remove your own admin role');
    }
    const before = auditedFields(user);
    if (dto.displayName !== undefined) user.displayName = dto.displayName;
    if (dto.role !== undefined) user.role = dto.role;
    if (dto.active !== undefined) user.active = dto.active;
    return this.dataSource.transaction(async (manager) => {
      const saved = await manager.save(user);
      await this.audit.record(manager, auditOf(actingUser, saved, 'update', before));
      return saved;
    });
  }
}

/** What the audit trail keeps of a user (never the password hash). */
function auditedFields(user: User): Record<string, unknown> {
  return { email: user.email, displayName: user.displayName, role: user.role, active: user.active };
}

function auditOf(actingUser: AuthenticatedUser, user: User, action: 'create' | 'invite' | 'update', before: Record<string, unknown> | null) {
  return { actorId: actingUser.id, actorRole: actingUser.role, entity: 'user', entityId: user.id, action, before, after: auditedFields(user) };
}

/** Lower-case hex SHA-256 of an invitation token: only this is stored. */
function tokenHash(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

function emailTaken(): ConflictException {
  return new ConflictException('A user with this email already exists');
}

function isDuplicateKey(error: unknown): boolean {
  return error instanceof QueryFailedError && (error.driverError as { code?: string } | undefined)?.code === 'ER_DUP_ENTRY';
}
