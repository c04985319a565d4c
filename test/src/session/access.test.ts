import { areaOfPath, landingHref, mayEnter } from '@/session/access';
import { navItemsFor, SIGNED_OUT_ITEMS } from '@/session/nav-items';
import { ROLES } from '@shared/types/roles';

// The areas each role may enter, as the product brief lays them out (no published source).
describe('mayEnter', () => {
  it.each([
    ['rider', ['rider']],
    ['desk', ['desk']],
    ['counter', ['counter']],
    ['admin', ['desk', 'counter', 'admin']],
  ] as const)('lets the %s into %j only', (role, areas) => {
    expect(ROLES.filter((area) => mayEnter(role, area))).toEqual(areas);
  });
});

describe('areaOfPath', () => {
  it('reads the first segment of an app path', () => {
    expect(areaOfPath('/admin/users?q=ada')).toBe('admin');
    expect(areaOfPath('/rider')).toBe('rider');
    expect(areaOfPath('/riders')).toBeUndefined();
    expect(areaOfPath('/')).toBeUndefined();
  });
});

describe('landingHref', () => {
  it('sends each role to its own area when no address was asked for', () => {
    expect(ROLES.map((role) => landingHref(role, undefined))).toEqual(['/rider', '/desk', '/counter', '/admin']);
  });

  it('goes back to the address asked for when the role may open it', () => {
    expect(landingHref('admin', '/admin/users')).toBe('/admin/users');
    expect(landingHref('admin', '/desk')).toBe('/desk');
    expect(landingHref('rider', '/rider')).toBe('/rider');
  });

  it("ignores an address in another role's area", () => {
    expect(landingHref('rider', '/admin/users')).toBe('/rider');
    expect(landingHref('desk', '/counter')).toBe('/desk');
  });

  it('ignores anything that is not a path inside the app', () => {
    expect(landingHref('admin', 'https://elsewhere.example/admin')).toBe('/admin');
    expect(landingHref('admin', '//elsewhere.example/admin')).toBe('/admin');
    expect(landingHref('admin', '/\\elsewhere.example/admin')).toBe('/admin');
    expect(landingHref('admin', '/sign-in')).toBe('/admin');
    expect(landingHref('admin', '/')).toBe('/admin');
  });
});

describe('navItemsFor', () => {
  const labels = (role: Parameters<typeof navItemsFor>[0]) => navItemsFor(role).map((item) => item.label);

  it('offers home and sign-in while nobody is signed in', () => {
    expect(navItemsFor(null)).toBe(SIGNED_OUT_ITEMS);
    expect(labels(null)).toEqual(['Home', 'Sign in']);
  });

  it('offers each role its own area only', () => {
    expect(labels('rider')).toEqual(['Garage']);
    expect(labels('desk')).toEqual(['Quotes', 'Customers', 'Damping rules']);
    expect(labels('counter')).toEqual(['Catalogue', 'Rates', 'Import', 'Low stock', 'Movements', 'Identify']);
  });

  it("offers the admin the shop's screens first, then the desk and the counter", () => {
    expect(navItemsFor('admin').map(({ label, href }) => [label, href])).toEqual([
      ['Shop', '/admin'],
      ['Users', '/admin/users'],
      ['Outbox', '/admin/outbox'],
      ['Shop data', '/admin/bike-models'],
      ['Quotes', '/desk'],
      ['Customers', '/desk/customers'],
      ['Damping rules', '/desk/damping-rules'],
      ['Catalogue', '/counter'],
      ['Rates', '/counter/rates'],
      ['Import', '/counter/import'],
      ['Low stock', '/counter/low-stock'],
      ['Movements', '/counter/movements'],
      ['Identify', '/counter/identify'],
    ]);
  });
});
