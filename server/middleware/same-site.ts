/**
 * For the routes that read or set the refresh cookie: refuses a request another site made a browser
 * send, such as a form auto-submitted to /api/auth/refresh to sign its visitor out. Browsers name
 * the sending site in Sec-Fetch-Site (over https and on localhost) and Origin (on every POST). A
 * request with neither header does not come from another site's page (curl, a script) and passes.
 */
import { Request, RequestHandler } from 'express';
import type { AppContext } from '../app-context';
import { ForbiddenError } from '../errors';

const REFUSED = "This request came from another site's page, so it was refused. Open the shop's own page and try again.";

export function sameSiteOnly(ctx: Pick<AppContext, 'config' | 'publicAddress'>): RequestHandler {
  /**
   * The shop's public address, a configured dev origin, or the address the request was sent to: a
   * phone on the shop's network reaches it by the machine's own address, and a page on another site
   * cannot make a browser send its own origin with the shop's Host.
   */
  async function trusted(origin: string, req: Request): Promise<boolean> {
    if (ctx.config.corsOrigins.includes(origin)) return true;
    if (origin === `${req.protocol}://${req.host}`) return true;
    return origin === (await ctx.publicAddress.current())?.origin;
  }

  return async (req, _res, next) => {
    if (req.get('sec-fetch-site') === 'cross-site') throw new ForbiddenError(REFUSED, 'cross-site');
    const origin = req.get('origin');
    if (origin !== undefined && !(await trusted(origin, req))) throw new ForbiddenError(REFUSED, 'cross-site');
    next();
  };
}
