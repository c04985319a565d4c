/** The desk's customers: riders found by name or e-mail with their bike count, and walk-in accounts. */
import { randomBytes } from 'node:crypto';
import { EntityManager } from 'typeorm';
import type { CustomerSummary } from '../../shared/types/quote';
import type { Role } from '../../shared/types/roles';
import type { AppContext } from '../app-context';
import { Bike } from '../entities/bike.entity';
import { User } from '../entities/user.entity';
import { hashPassword } from './password.service';
import { insertUser } from './users.service';

/** A customer is a rider account: a staff account is never named as one. */
export const CUSTOMER_ROLE: Role = 'rider';

export function isCustomer(manager: EntityManager, id: number): Promise<boolean> {
  return manager.existsBy(User, { id, role: CUSTOMER_ROLE });
}

export interface CustomerPage {
  customers: CustomerSummary[];
  total: number;
  page: number;
  pageSize: number;
}

export class CustomersService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now'>) {}

  async search(query: { q: string; page: number; pageSize: number }): Promise<CustomerPage> {
    const qb = this.ctx.db.read
      .getRepository(User)
      .createQueryBuilder('u')
      .select(['u.id AS id', 'u.name AS name', 'u.email AS email', 'u.createdAt AS createdAt'])
      .addSelect((sub) => sub.select('COUNT(*)').from(Bike, 'b').where('b.ownerId = u.id'), 'bikes')
      .where('u.role = :role', { role: CUSTOMER_ROLE });
    if (query.q) {
      const like = `%${query.q.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      qb.andWhere("(lower(u.name) LIKE :like ESCAPE '\\' OR u.email LIKE :like ESCAPE '\\')", { like });
    }
    const total = await qb.clone().getCount();
    const rows = await qb
      .orderBy('u.name', 'ASC')
      .addOrderBy('u.id', 'ASC')
      .offset((query.page - 1) * query.pageSize)
      .limit(query.pageSize)
      .getRawMany<{ id: number; name: string; email: string; createdAt: string; bikes: number }>();
    return {
      customers: rows.map((r) => ({ id: r.id, name: r.name, email: r.email, bikes: Number(r.bikes), createdAt: new Date(`${r.createdAt.replace(' ', 'T')}Z`).toISOString() })),
      total,
      page: query.page,
      pageSize: query.pageSize,
    };
  }

  /** A rider account for a walk-in, with a random password nobody knows: they set their own through a reset. */
  async createWalkIn(input: { name: string; email: string }): Promise<CustomerSummary> {
    const passwordHash = await hashPassword(randomBytes(24).toString('base64url'));
    const user = await this.ctx.db.write((manager) => insertUser(manager, { name: input.name, email: input.email, role: CUSTOMER_ROLE }, passwordHash, this.ctx.now()));
    return { id: user.id, name: user.name, email: user.email, bikes: 0, createdAt: user.createdAt.toISOString() };
  }
}
