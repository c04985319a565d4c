/** The admin's shop data editors: target profiles, the engine's settings, and the audit of every edit. */
import { auditQuerySchema, targetProfileUpdateSchema } from '../../shared/schemas/shop-data.schema';
import type { AppContext } from '../app-context';
import { NotFoundError } from '../errors';
import { currentUser } from '../middleware/auth';
import { AuditService } from '../services/audit.service';
import { ProfileInput, ShopDataService } from '../services/shop-data.service';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const adminOnly = signedIn('admin');

export function shopDataRoutes(ctx: AppContext): RouteSpec[] {
  const shopData = new ShopDataService(ctx);
  const audit = new AuditService(ctx);
  return [
    {
      method: 'put',
      path: '/target-profiles/:discipline',
      access: adminOnly,
      handler: async (req, res) => {
        const discipline = String(req.params.discipline);
        if (!(await ctx.sizingData.profileList()).has(discipline)) throw new NotFoundError('There is no such target profile.');
        const input = (await parseInput(targetProfileUpdateSchema, req.body)) as ProfileInput;
        res.json({ profile: await shopData.updateProfile(currentUser(req), discipline, input) });
      },
    },
    {
      method: 'get',
      path: '/engine-settings',
      access: adminOnly,
      handler: async (_req, res) => {
        res.json({ settings: await shopData.settings() });
      },
    },
    {
      method: 'patch',
      path: '/engine-settings',
      access: adminOnly,
      handler: async (req, res) => {
        res.json({ settings: await shopData.updateSettings(currentUser(req), req.body?.values) });
      },
    },
    {
      method: 'get',
      path: '/audit',
      access: adminOnly,
      handler: async (req, res) => {
        res.json(await audit.list(await parseInput(auditQuerySchema, req.query)));
      },
    },
  ];
}
