/** The admin's user management: list and search, create any account, change a role, switch an account off or on. */
import { Request } from 'express';
import { activeChangeSchema, roleChangeSchema, staffCreateSchema, userSearchSchema } from '../../shared/schemas/auth.schema';
import type { AppContext } from '../app-context';
import { NotFoundError } from '../errors';
import { currentUser } from '../middleware/auth';
import { toAccountUser, UsersService } from '../services/users.service';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const adminOnly = signedIn('admin');

function userId(req: Request): number {
  const id = Number(req.params.id);
  if (!Number.isSafeInteger(id) || id < 1) throw new NotFoundError('There is no such account.');
  return id;
}

export function userRoutes(ctx: AppContext): RouteSpec[] {
  const users = new UsersService(ctx);
  return [
    {
      method: 'get',
      path: '/users',
      access: adminOnly,
      handler: async (req, res) => {
        res.json(await users.list(await parseInput(userSearchSchema, req.query)));
      },
    },
    {
      method: 'post',
      path: '/users',
      access: adminOnly,
      handler: async (req, res) => {
        const user = await users.create(await parseInput(staffCreateSchema, req.body));
        res.status(201).json({ user: toAccountUser(user) });
      },
    },
    {
      method: 'patch',
      path: '/users/:id/role',
      access: adminOnly,
      handler: async (req, res) => {
        const { role } = await parseInput(roleChangeSchema, req.body);
        res.json({ user: toAccountUser(await users.changeRole(currentUser(req).id, userId(req), role)) });
      },
    },
    {
      method: 'patch',
      path: '/users/:id/active',
      access: adminOnly,
      handler: async (req, res) => {
        const { active } = await parseInput(activeChangeSchema, req.body);
        res.json({ user: toAccountUser(await users.setActive(currentUser(req).id, userId(req), active)) });
      },
    },
  ];
}
