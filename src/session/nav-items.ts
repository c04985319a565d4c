/** What the app frame's navigation offers: the areas the signed-in role may enter, own area first. */
import type { NavItem } from '@/components/ui/app-frame';
import type { Role } from '@shared/types/roles';

import { AREAS, mayEnter, type Area } from './access';

const AREA_ITEMS: Record<Area, readonly NavItem[]> = {
  rider: [{ href: '/rider', label: 'Garage' }],
  desk: [
    { href: '/desk', label: 'Quotes' },
    { href: '/desk/customers', label: 'Customers' },
    { href: '/desk/damping-rules', label: 'Damping rules' },
  ],
  counter: [
    { href: '/counter', label: 'Catalogue' },
    { href: '/counter/rates', label: 'Rates' },
    { href: '/counter/import', label: 'Import' },
    { href: '/counter/low-stock', label: 'Low stock' },
    { href: '/counter/movements', label: 'Movements' },
    { href: '/counter/identify', label: 'Identify' },
  ],
  admin: [
    { href: '/admin', label: 'Shop' },
    { href: '/admin/users', label: 'Users' },
    { href: '/admin/outbox', label: 'Outbox' },
    { href: '/admin/bike-models', label: 'Shop data' },
  ],
};

export const SIGNED_OUT_ITEMS: readonly NavItem[] = [
  { href: '/', label: 'Home' },
  { href: '/sign-in', label: 'Sign in' },
];

/** `null` while nobody is signed in. */
/** What a group of items is called when a person reaches more than one area. */
const AREA_NAMES: Record<Area, string> = {
  rider: 'Garage',
  desk: 'Service desk',
  counter: 'Parts counter',
  admin: 'Shop admin',
};

export function navItemsFor(role: Role | null): readonly NavItem[] {
  if (!role) return SIGNED_OUT_ITEMS;
  const areas = [role, ...AREAS.filter((area) => area !== role && mayEnter(role, area))];
  if (areas.length === 1) return AREA_ITEMS[role];
  return areas.flatMap((area) => AREA_ITEMS[area].map((item) => ({ ...item, group: AREA_NAMES[area] })));
}
