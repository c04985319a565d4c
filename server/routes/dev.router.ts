/** Development only: the admin reads what the local SMTP stand-in caught. Absent (404) in production. */
import type { AppContext } from '../app-context';
import { NotFoundError } from '../errors';
import { RouteSpec, signedIn } from './route-table';

export function devRoutes(ctx: AppContext): RouteSpec[] {
  const outbox = ctx.outbox;
  if (!outbox || ctx.config.production) return [];
  return [
    {
      method: 'get',
      path: '/dev/outbox',
      access: signedIn('admin'),
      handler: (_req, res) => {
        res.json({ mails: outbox.list() });
      },
    },
    {
      method: 'get',
      path: '/dev/outbox/:id',
      access: signedIn('admin'),
      handler: (req, res) => {
        const mail = outbox.read(String(req.params.id));
        if (!mail) throw new NotFoundError('There is no such mail in the outbox.');
        res.json({ mail });
      },
    },
  ];
}
