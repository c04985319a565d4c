/** Ownership rule of the accounts issue: desk and admin see every customer's records, a rider (or the counter) only their own. */
import { HttpError } from '../../../server/errors';
import { assertOwnerOrStaff, seesAllCustomers } from '../../../server/middleware/ownership';
import { Role } from '../../../shared/types/roles';

function outcome(role: Role, ownerId: number): number | 'allowed' {
  try {
    assertOwnerOrStaff({ id: 7, role }, ownerId);
    return 'allowed';
  } catch (err) {
    return err instanceof HttpError ? err.status : -1;
  }
}

test.each([
  ['rider', 7, 'allowed'],
  ['rider', 8, 404],
  ['counter', 8, 404],
  ['counter', 7, 'allowed'],
  ['desk', 8, 'allowed'],
  ['admin', 8, 'allowed'],
] as const)('%s with id 7 on a record owned by %i: %s', (role, ownerId, expected) => {
  expect(outcome(role, ownerId)).toBe(expected);
});

test('only desk and admin see all customers', () => {
  expect((['rider', 'desk', 'counter', 'admin'] as const).filter((role) => seesAllCustomers({ role }))).toEqual(['desk', 'admin']);
});
