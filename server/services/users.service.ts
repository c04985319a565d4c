/** Accounts: creating them, checking credentials, and the admin's changes, with the rules that keep the shop an admin. */
import { EntityManager } from 'typeorm';
import { AccountUser, UserPage } from '../../shared/types/account';
import { Role } from '../../shared/types/roles';
import type { AppContext } from '../app-context';
import { User } from '../entities/user.entity';
import { ConflictError, ForbiddenError, NotFoundError, UnauthorizedError } from '../errors';
import { hashPassword, verifyPassword } from './password.service';

export interface NewAccount {
  name: string;
  email: string;
  role: Role;
  password: string;
}

export interface UserSearch {
  q: string;
  page: number;
  pageSize: number;
}

/** One message for an unknown e-mail and a wrong password, so the answer does not reveal who has an account. */
export const BAD_CREDENTIALS = 'The e-mail or password is wrong.';

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export function toAccountUser(user: User): AccountUser {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    createdAt: user.createdAt.toISOString(),
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
  };
}

/** Inserts inside the caller's transaction; the password is hashed beforehand, outside the write queue. */
export async function insertUser(manager: EntityManager, account: Omit<NewAccount, 'password'>, passwordHash: string, now: Date): Promise<User> {
  const email = normaliseEmail(account.email);
  const users = manager.getRepository(User);
  if (await users.existsBy({ email })) {
    throw new ConflictError('An account with this e-mail already exists.', 'email-taken', {
      email: 'An account with this e-mail already exists.',
    });
  }
  return users.save(users.create({ ...account, email, passwordHash, active: true, tokenVersion: 0, createdAt: now, lastSignInAt: null }));
}

export class UsersService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  find(id: number): Promise<User | null> {
    return this.ctx.db.read.getRepository(User).findOneBy({ id });
  }

  findByEmail(email: string): Promise<User | null> {
    return this.ctx.db.read.getRepository(User).findOneBy({ email: normaliseEmail(email) });
  }

  async create(account: NewAccount): Promise<User> {
    const passwordHash = await hashPassword(account.password);
    return this.ctx.db.write((manager) => insertUser(manager, account, passwordHash, this.ctx.now()));
  }

  /** The account for these credentials, its sign-in time recorded. */
  async signIn(email: string, password: string): Promise<User> {
    const user = await this.findByEmail(email);
    const matches = await verifyPassword(user?.passwordHash, password);
    if (!user || !matches) throw new UnauthorizedError(BAD_CREDENTIALS, 'bad-credentials');
    // Said only to someone who knows the password, so it reveals nothing to a stranger.
    if (!user.active) throw new ForbiddenError('This account has been switched off; ask the shop.', 'account-inactive');
    const lastSignInAt = this.ctx.now();
    await this.ctx.db.write((manager) => manager.update(User, user.id, { lastSignInAt }));
    return { ...user, lastSignInAt };
  }

  /** Revokes every token the user holds. */
  async revokeTokens(id: number): Promise<void> {
    await this.ctx.db.write((manager) => manager.increment(User, { id }, 'tokenVersion', 1));
  }

  async list({ q, page, pageSize }: UserSearch): Promise<UserPage> {
    const query = this.ctx.db.read.getRepository(User).createQueryBuilder('u');
    if (q) {
      const pattern = `%${q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      query.where(`(lower(u.name) LIKE :pattern ESCAPE '\\' OR u.email LIKE :pattern ESCAPE '\\')`, { pattern });
    }
    const [users, total] = await query
      .orderBy('u.name', 'ASC')
      .addOrderBy('u.id', 'ASC')
      .skip((page - 1) * pageSize)
      .take(pageSize)
      .getManyAndCount();
    return { users: users.map(toAccountUser), total, page, pageSize };
  }

  async changeRole(actorId: number, id: number, role: Role): Promise<User> {
    if (actorId === id && role !== 'admin') {
      throw new ConflictError('You cannot take away your own admin role; another admin can.', 'own-account');
    }
    return this.update(id, () => ({ role }));
  }

  /** Deactivating also raises the token version, so switching the account back on later does not revive old tokens. */
  async setActive(actorId: number, id: number, active: boolean): Promise<User> {
    if (actorId === id && !active) {
      throw new ConflictError('You cannot switch off your own account; another admin can.', 'own-account');
    }
    return this.update(id, (user) => ({
      active,
      tokenVersion: user.active && !active ? user.tokenVersion + 1 : user.tokenVersion,
    }));
  }

  private update(id: number, change: (user: User) => Partial<User>): Promise<User> {
    return this.ctx.db.write(async (manager) => {
      const user = await manager.findOneBy(User, { id });
      if (!user) throw new NotFoundError('There is no such account.');
      const changed = { ...user, ...change(user) };
      await manager.save(User, changed);
      return changed;
    });
  }
}
