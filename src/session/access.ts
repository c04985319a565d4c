/**
 * Which part of the app each role may open, and where a person goes after signing in. Each role
 * has an area of its own under the URL segment of the same name; the admin may also work the
 * service desk and the parts counter. The server checks every request on its own; this only
 * decides what the app offers.
 */
import type { Href } from 'expo-router';

import { ROLES, type Role } from '@shared/types/roles';

export type Area = Role;

export const AREAS: readonly Area[] = ROLES;

const AREA_ROLES: Record<Area, readonly Role[]> = {
  rider: ['rider'],
  desk: ['desk', 'admin'],
  counter: ['counter', 'admin'],
  admin: ['admin'],
};

/** How a role is named to people. */
export const ROLE_LABELS: Record<Role, string> = {
  rider: 'Rider',
  desk: 'Service desk',
  counter: 'Parts counter',
  admin: 'Admin',
};

export function mayEnter(role: Role, area: Area): boolean {
  return AREA_ROLES[area].includes(role);
}

/** The landing screen of a role's own area. */
export function areaHref(role: Role): `/${Role}` {
  return `/${role}`;
}

/** The area an app path lies in, or undefined for a public path. */
export function areaOfPath(path: string): Area | undefined {
  const [first] = path.replace(/^\/+/, '').split(/[/?#]/);
  return AREAS.find((area) => area === first);
}

/**
 * After signing in: back to `next` when it is a path inside an area the role may enter,
 * otherwise the role's own area. Anything else in `next` (another site, a public page) is ignored.
 */
export function landingHref(role: Role, next: string | undefined): string {
  if (next && /^\/(?![/\\])/.test(next)) {
    const area = areaOfPath(next);
    if (area && mayEnter(role, area)) return next;
  }
  return areaHref(role);
}

/** The sign-in screen, told where to come back to. */
export function signInHref(next: string): Href {
  return { pathname: '/sign-in', params: { next } };
}
