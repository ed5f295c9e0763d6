import { ConflictException, ForbiddenException, Injectable, NotFoundException, UnauthorizedException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, type EntityManager, In, type Repository } from 'typeorm';
import { ROLE_LABELS, type Role, type SessionProfile, type SessionUser, type User as UserResponse } from '@lockstep/shared';
import { Ward } from '../wards/entities/ward.entity.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { toSessionProfile, toSessionUser, toUserResponse } from './dto/user-response.js';
import { User } from './entities/user.entity.js';
import { hashPassword, passwordMatches } from './passwords.js';
import { PasswordAttemptsService } from '../common/throttling/password-attempts.service.js';
import type { AuthUser } from '../auth/auth-user.js';
import { changedFields, recordAudit } from '../audit/record-audit.js';
import { fieldError, fieldErrors } from '../common/errors/field-error.js';

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectDataSource() private readonly dataSource: DataSource,
    // Counts wrong signature and colleague passwords (ThrottlingModule is global).
    private readonly attempts: PasswordAttemptsService,
  ) {}

  /** The signed-in person if the credentials are right and the account is active. */
  async verifyCredentials(username: string, password: string): Promise<SessionUser | null> {
    const user = await this.users.findOneBy({ username });
    const matches = await passwordMatches(password, user?.passwordHash);
    return user && matches && user.active ? toSessionUser(user) : null;
  }

  /** A signature is the caller's own password typed again; a wrong one is a 401 and nothing is signed. */
  async verifySignature(userId: number, password: string): Promise<void> {
    const user = await this.users.findOneBy({ id: userId, active: true });
    const matches = await this.attempts.check(
      user?.username,
      async () => user !== null && (await passwordMatches(password, user.passwordHash)),
    );
    if (!matches) {
      throw new UnauthorizedException({
        statusCode: 401,
        message: 'The password you signed with is not correct',
        errors: [{ field: 'signature.password', message: 'The password you signed with is not correct' }],
      });
    }
  }

  /**
   * A colleague signing in on the same screen (second check, witness): right password, active,
   * one of the allowed roles, and not the person already signed in.
   */
  async verifyColleague(username: string, password: string, roles: readonly Role[], notUserId: number, field = ''): Promise<SessionUser> {
    const at = (name: string) => (field ? `${field}.${name}` : name);
    const colleague = await this.attempts.check(username, () => this.verifyCredentials(username.trim(), password));
    if (!colleague) {
      throw new UnauthorizedException({
        statusCode: 401,
        message: 'The second person’s username or password is incorrect',
        errors: [{ field: at('password'), message: 'Username or password is incorrect' }],
      });
    }
    if (colleague.id === notUserId) {
      throw fieldErrors('A second, different person must sign', [
        { field: at('username'), message: 'You cannot be both people: a different colleague signs here' },
      ]);
    }
    if (!roles.includes(colleague.role)) {
      throw new ForbiddenException(
        `${colleague.displayName} is a ${ROLE_LABELS[colleague.role].toLowerCase()}; only a nurse or charge nurse can sign here`,
      );
    }
    return colleague;
  }

  async findActiveSessionUser(id: number): Promise<SessionUser | null> {
    const user = await this.users.findOneBy({ id, active: true });
    return user ? toSessionUser(user) : null;
  }

  /** For the signed-in person's own screens (sign-in and `/auth/me`), with their wards. */
  async profile(id: number): Promise<SessionProfile> {
    const user = await this.users.findOneOrFail({ where: { id }, relations: { wards: true } });
    return toSessionProfile(user);
  }

  async list(): Promise<UserResponse[]> {
    const users = await this.users.find({ relations: { wards: true }, order: { username: 'ASC' } });
    return users.map(toUserResponse);
  }

  async create(dto: CreateUserDto, admin: AuthUser): Promise<UserResponse> {
    // Hashing takes ~100 ms: do it before the transaction, which holds the database's one writer.
    const passwordHash = await hashPassword(dto.password);
    return this.dataSource.transaction(async (manager) => {
      if (await manager.existsBy(User, { username: dto.username })) {
        throw new ConflictException({
          statusCode: 409,
          message: `The username ${dto.username} is already taken`,
          errors: [{ field: 'username', message: 'This username is already taken' }],
        });
      }
      const user = manager.create(User, {
        username: dto.username,
        displayName: dto.displayName.trim(),
        role: dto.role,
        active: true,
        passwordHash,
        wards: await findWards(manager, dto.wardIds),
      });
      const created = toUserResponse(await manager.save(user));
      await recordAudit(manager, admin, {
        action: 'user.create',
        entityType: 'user',
        entityId: created.id,
        summary: { username: created.username, displayName: created.displayName, role: created.role, wardIds: created.wardIds },
      });
      return created;
    });
  }

  async update(id: number, dto: UpdateUserDto, admin: AuthUser): Promise<UserResponse> {
    const passwordHash = dto.password === undefined ? undefined : await hashPassword(dto.password);
    return this.dataSource.transaction(async (manager) => {
      const user = await manager.findOne(User, { where: { id }, relations: { wards: true } });
      if (!user) throw new NotFoundException(`No user with id ${id}`);
      const before = toUserResponse(user);
      if (dto.displayName !== undefined) user.displayName = dto.displayName.trim();
      if (dto.role !== undefined) user.role = dto.role;
      if (dto.active !== undefined) user.active = dto.active;
      if (passwordHash !== undefined) user.passwordHash = passwordHash;
      if (dto.wardIds !== undefined) user.wards = await findWards(manager, dto.wardIds);
      const after = toUserResponse(await manager.save(user));
      await recordAudit(manager, admin, {
        action: 'user.update',
        entityType: 'user',
        entityId: id,
        summary: {
          ...changedFields(before, after, ['displayName', 'role', 'active', 'wardIds']),
          ...(passwordHash ? { passwordReset: true } : {}),
        },
      });
      return after;
    });
  }
}

async function findWards(manager: EntityManager, ids: number[]): Promise<Ward[]> {
  const unique = [...new Set(ids)];
  const found = await manager.findBy(Ward, { id: In(unique) });
  const missing = unique.filter((id) => !found.some((ward) => ward.id === id));
  if (missing.length > 0) {
    throw fieldError('wardIds', `No ward with id ${missing.join(', ')}`);
  }
  return found;
}
