import { Request } from 'express';
import { AppContext } from '../context';

/** Where links in mails point: the configured address, else the web app the request came from (a listed dev origin, or its host). */
export function publicBaseUrl(ctx: AppContext, req: Request): string {
  if (ctx.config.publicUrl) return ctx.config.publicUrl;
  const origin = req.get('origin');
  if (origin && ctx.config.corsOrigins.includes(origin)) return origin;
  return `${req.protocol}://${req.get('host')}`;
}
