import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { ArrayContains, ILike, type FindOptionsWhere, type Repository } from 'typeorm';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import type { ListUsersQuery } from './dto/user-input.schemas.js';
import type { UserDto } from './dto/user.dto.js';
import { endAllSessions } from '../auth/session-check.service.js';
import { hashPassword } from './password.js';
import type { Role } from './role.js';
import { UserEntity } from './user.entity.js';
import { toUserDto } from './user.mapper.js';

export interface NewUser {
  email: string;
  displayName: string;
  roles: Role[];
  /** Omitted for an invited user, who sets a password later through `setPassword`. */
  password?: string;
}

export interface UserChanges {
  version: number;
  displayName?: string;
  roles?: Role[];
  active?: boolean;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A user row together with its password hash (which is not selected by default). */
export type UserWithPassword = UserEntity & { passwordHash: string | null };

const PG_UNIQUE_VIOLATION = '23505';

function sameRoles(a: Role[], b: Role[]): boolean {
  return a.length === b.length && a.every((role) => b.includes(role));
}

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (char) => `\\${char}`);
}

/** Users of one shop. Every method takes the caller's shopId; ids of another shop answer 404. */
@Injectable()
export class UsersService {
  constructor(@InjectRepository(UserEntity) private readonly users: Repository<UserEntity>) {}

  async list(shopId: string, query: ListUsersQuery): Promise<Page<UserDto>> {
    const base: FindOptionsWhere<UserEntity> = { shopId };
    if (query.role) base.roles = ArrayContains([query.role]);
    if (query.active !== undefined) base.active = query.active;
    const pattern = query.search ? `%${escapeLike(query.search)}%` : undefined;
    const where = pattern
      ? [{ ...base, email: ILike(pattern) }, { ...base, displayName: ILike(pattern) }]
      : base;
    const [rows, total] = await this.users.findAndCount({
      where,
      order: { displayName: 'ASC', id: 'ASC' },
      skip: (query.page - 1) * query.pageSize,
      take: query.pageSize,
    });
    return { items: rows.map(toUserDto), total, page: query.page, pageSize: query.pageSize };
  }

  async getOwn(shopId: string, userId: string): Promise<UserEntity> {
    const user = await this.users.findOneBy({ id: userId, shopId });
    if (!user) throw new NotFoundError('The user');
    return user;
  }

  async createUser(shopId: string, input: NewUser): Promise<UserEntity> {
    const email = input.email.trim().toLowerCase();
    if (await this.users.existsBy({ email })) throw this.emailTaken();
    const user = this.users.create({
      shopId,
      email,
      displayName: input.displayName,
      roles: input.roles,
      active: true,
      passwordHash: input.password === undefined ? null : await hashPassword(input.password),
    });
    try {
      return await this.users.save(user);
    } catch (error) {
      // Two requests raced past the check above; the unique index decides.
      if ((error as { driverError?: { code?: string } }).driverError?.code === PG_UNIQUE_VIOLATION) {
        throw this.emailTaken();
      }
      throw error;
    }
  }

  /**
   * Applies an edit made against `changes.version`. A stale version answers 409 with the current
   * user so the form can show what changed. Admins cannot lock themselves out.
   */
  async updateUser(shopId: string, actorId: string, userId: string, changes: UserChanges): Promise<UserEntity> {
    const user = await this.getOwn(shopId, userId);
    if (user.version !== changes.version) throw this.staleVersion(user);
    if (userId === actorId) this.assertNotSelfLockout(changes);

    const { version, ...fields } = changes;
    const updates = Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined));
    if (Object.keys(updates).length === 0) return user;

    const rolesChanged = changes.roles !== undefined && !sameRoles(changes.roles, user.roles);
    const deactivated = changes.active === false && user.active;
    const affected = await this.users.manager.transaction(async (manager) => {
      const result = await manager.update(UserEntity, { id: userId, shopId, version }, updates);
      // Tokens issued under the old roles or while active stop working on the next request.
      if (result.affected && (rolesChanged || deactivated)) await endAllSessions(manager, userId);
      return result.affected;
    });
    if (!affected) throw this.staleVersion(await this.getOwn(shopId, userId));
    return this.getOwn(shopId, userId);
  }

  /** Sign-in looks users up by e-mail across shops: the e-mail is unique system-wide. */
  async findForSignIn(email: string): Promise<UserWithPassword | null> {
    return (await this.users
      .createQueryBuilder('user')
      .addSelect('user.passwordHash')
      .where('lower(user.email) = lower(:email)', { email: email.trim() })
      .getOne()) as UserWithPassword | null;
  }

  /** For token refresh: the user behind a session, if still active. */
  async findActive(userId: string): Promise<UserEntity | null> {
    return this.users.findOneBy({ id: userId, active: true });
  }

  private assertNotSelfLockout(changes: UserChanges): void {
    if (changes.roles && !changes.roles.includes('admin')) {
      throw new ValidationError([{ path: 'roles', message: 'You cannot remove your own admin role.' }]);
    }
    if (changes.active === false) {
      throw new ValidationError([{ path: 'active', message: 'You cannot deactivate your own account.' }]);
    }
  }

  private emailTaken(): ConflictError {
    return new ConflictError('A user with this e-mail already exists.');
  }

  private staleVersion(current: UserEntity): ConflictError {
    return new ConflictError('This user was changed by someone else. Review the current values and try again.', {
      current: toUserDto(current),
    });
  }
}
