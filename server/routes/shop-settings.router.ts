/** The shop's terms for quotes: the desk reads them, the admin sets them. */
import { shopSettingsSchema } from '../../shared/schemas/shop-settings.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { ShopSettingsService } from '../services/shop-settings.service';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

export function shopSettingsRoutes(ctx: AppContext): RouteSpec[] {
  const settings = new ShopSettingsService(ctx);
  return [
    {
      method: 'get',
      path: '/shop-settings',
      access: signedIn('desk', 'admin'),
      handler: async (_req, res) => {
        res.json({ settings: await settings.get() });
      },
    },
    {
      method: 'put',
      path: '/shop-settings',
      access: signedIn('admin'),
      handler: async (req, res) => {
        res.json({ settings: await settings.put(currentUser(req), await parseInput(shopSettingsSchema, req.body)) });
      },
    },
  ];
}
