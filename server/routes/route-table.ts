/**
 * Every API route is declared here with its access class, so guards are applied in one place
 * and the authorization test can walk the whole table (Express cannot list its own routes).
 */
import { RequestHandler, Router } from 'express';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export type Access = { kind: 'public' };

export interface RouteSpec {
  method: Method;
  /** Path below /api, in Express syntax. */
  path: string;
  access: Access;
  handler: RequestHandler;
}

export const publicAccess: Access = { kind: 'public' };

/** Wraps an async handler so a rejected promise reaches the error middleware. */
export function handle(fn: RequestHandler): RequestHandler {
  return (req, res, next) => {
    Promise.resolve(fn(req, res, next)).catch(next);
  };
}

export function mountRoutes(routes: RouteSpec[]): Router {
  const router = Router();
  for (const route of routes) {
    router[route.method](route.path, handle(route.handler));
  }
  return router;
}
