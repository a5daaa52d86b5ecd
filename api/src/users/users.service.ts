import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { DataSource, QueryFailedError, type Repository } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthenticatedUser } from '../auth/authenticated-user';
import type { CreateUserDto } from './dto/create-user.dto';
import type { UpdateUserDto } from './dto/update-user.dto';
import { normalizeEmail } from './email';
import { PasswordService } from './password.service';
import { User } from './user.entity';

/** Reads and changes users; the only place that writes the users table. */
@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly passwords: PasswordService,
    private readonly dataSource: DataSource,
    private readonly audit: AuditService,
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

function auditOf(actingUser: AuthenticatedUser, user: User, action: 'create' | 'update', before: Record<string, unknown> | null) {
  return { actorId: actingUser.id, actorRole: actingUser.role, entity: 'user', entityId: user.id, action, before, after: auditedFields(user) };
}

function emailTaken(): ConflictException {
  return new ConflictException('A user with this email already exists');
}

function isDuplicateKey(error: unknown): boolean {
  return error instanceof QueryFailedError && (error.driverError as { code?: string } | undefined)?.code === 'ER_DUP_ENTRY';
}
