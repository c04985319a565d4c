/** Who sees whose records: the service desk and the admin see every customer's, anyone else only their own. */
import { Role } from '../../shared/types/roles';
import { NotFoundError } from '../errors';
import type { AuthUser } from '../types/auth-user';

export const SEES_ALL_CUSTOMERS: readonly Role[] = ['desk', 'admin'];

export function seesAllCustomers(user: Pick<AuthUser, 'role'>): boolean {
  return SEES_ALL_CUSTOMERS.includes(user.role);
}

/** Throws a 404 rather than a 403, so a rider cannot learn which ids belong to someone else. */
export function assertOwnerOrStaff(user: Pick<AuthUser, 'id' | 'role'>, ownerId: number): void {
  if (user.id !== ownerId && !seesAllCustomers(user)) throw new NotFoundError();
}
