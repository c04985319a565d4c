/** Accounts and session answers as the server sends them, for component tests. */
import type { AccountUser, SessionAnswer } from '@shared/types/account';
import type { Role } from '@shared/types/roles';

const NAMES: Record<Role, string> = {
  rider: 'Mara Linden',
  desk: 'Owen Hale',
  counter: 'Jun Castell',
  admin: 'Ada Brennick',
};

const IDS: Record<Role, number> = { rider: 1, desk: 2, counter: 3, admin: 4 };

export function accountUser(role: Role, overrides: Partial<AccountUser> = {}): AccountUser {
  return {
    id: IDS[role],
    email: `${role}@demo.test`,
    name: NAMES[role],
    role,
    active: true,
    createdAt: '2025-12-01T09:00:00.000Z',
    lastSignInAt: null,
    ...overrides,
  };
}

export function sessionAnswer(user: AccountUser, token = `token-${user.role}`): SessionAnswer {
  return { token, expiresIn: 900, user };
}
