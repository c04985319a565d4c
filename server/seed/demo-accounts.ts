/** One demo account per role, all with the same password; printed at start-up and used by tests. */
import { EntityManager } from 'typeorm';
import { Role } from '../../shared/types/roles';
import { hashPassword } from '../services/password.service';
import { insertUser } from '../services/users.service';

export const DEMO_PASSWORD = 'sagwright-demo';

export const DEMO_ACCOUNTS: readonly { email: string; name: string; role: Role }[] = [
  { email: 'rider@demo.test', name: 'Mara Linden', role: 'rider' },
  { email: 'desk@demo.test', name: 'Owen Hale', role: 'desk' },
  { email: 'counter@demo.test', name: 'Jun Castell', role: 'counter' },
  { email: 'admin@demo.test', name: 'Ada Brennick', role: 'admin' },
];

export async function seedDemoAccounts(manager: EntityManager): Promise<void> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const account of DEMO_ACCOUNTS) await insertUser(manager, account, passwordHash, new Date());
}
