import { RouteSpec, publicAccess } from './route-table';
import type { AppContext } from '../app-context';

export function healthRoutes(ctx: AppContext): RouteSpec[] {
  return [
    {
      method: 'get',
      path: '/health',
      access: publicAccess,
      handler: async (_req, res) => {
        try {
          const [row] = await ctx.db.read.query('SELECT sqlite_version() AS sqlite, COUNT(*) AS shops FROM shop');
          res.json({ ok: true, version: ctx.config.version, database: { ok: true, sqlite: row.sqlite } });
        } catch (err) {
          ctx.log('health check: database query failed', err);
          res.status(503).json({ ok: false, version: ctx.config.version, database: { ok: false } });
        }
      },
    },
  ];
}
