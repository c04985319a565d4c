/**
 * Every API route is declared here with its access class, so guards are applied in one place
 * and the authorization test can walk the whole table (Express cannot list its own routes).
 */
import { RequestHandler, Router } from 'express';
import { Role, ROLES } from '../../shared/types/roles';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/**
 * Who may call a route. Each kind has its guard in `Guards`, so a new kind (a customer's quote
 * link, a payment webhook) cannot be declared without saying how it is checked.
 */
export type Access =
  | { kind: 'public' }
  | { kind: 'signed-in'; roles: readonly Role[] }
  /** The customer's quote link: the `:token` of the path opens that one quote and nothing else. */
  | { kind: 'quote-token' }
  /** The payment provider's signed events; the handler verifies the signature over the raw body. */
  | { kind: 'webhook' };

export interface RouteSpec {
  method: Method;
  /** Path below /api, in Express syntax. */
  path: string;
  access: Access;
  /** Run in order after the guard, before the handler: the same-site check, rate limits. */
  before?: RequestHandler[];
  handler: RequestHandler;
}

export const publicAccess: Access = { kind: 'public' };

export const quoteTokenAccess: Access = { kind: 'quote-token' };

export const webhookAccess: Access = { kind: 'webhook' };

/** Any signed-in account, whatever its role. */
export const anyRole: Access = { kind: 'signed-in', roles: ROLES };

export function signedIn(...roles: [Role, ...Role[]]): Access {
  return { kind: 'signed-in', roles };
}

export type Guards = { [K in Access['kind']]: (access: Extract<Access, { kind: K }>) => RequestHandler[] };

/** Wraps an async handler so a rejected promise reaches the error middleware. */
export function handle(fn: RequestHandler): RequestHandler {
  return (req, res, next) => {
    Promise.resolve(fn(req, res, next)).catch(next);
  };
}

function guardFor(access: Access, guards: Guards): RequestHandler[] {
  // The mapped type pairs each kind with its guard; TypeScript cannot narrow the lookup itself.
  const guard = guards[access.kind] as (access: Access) => RequestHandler[];
  return guard(access);
}

export function mountRoutes(routes: RouteSpec[], guards: Guards): Router {
  const router = Router();
  for (const route of routes) {
    const chain = [...guardFor(route.access, guards), ...(route.before ?? []), route.handler];
    router[route.method](route.path, ...chain.map(handle));
  }
  return router;
}
