import { Slot } from 'expo-router';
import { fireEvent, renderRouter, screen, within } from 'expo-router/testing-library';
import { Text } from 'react-native';

import { AppFrame, currentHref, isCurrent, visibleNav, type FrameAccount, type NavItem } from '@/components/ui/app-frame';
import { colors } from '@/theme';

let mockIsWide = true;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const ITEMS: readonly NavItem[] = [
  { href: '/admin', label: 'Shop' },
  { href: '/admin/users', label: 'Users' },
  { href: '/desk', label: 'Quotes' },
];

function renderFrame(initialUrl: string, account?: FrameAccount, items: readonly NavItem[] = ITEMS) {
  return renderRouter(
    {
      _layout: () => (
        <AppFrame items={items} account={account}>
          <Slot />
        </AppFrame>
      ),
      index: () => <Text>Home page</Text>,
      'admin/index': () => <Text>Shop page</Text>,
      'admin/users': () => <Text>Users page</Text>,
      'desk/index': () => <Text>Quotes page</Text>,
    },
    { initialUrl },
  );
}

/** The navigation's links as label and target, in order. */
function navLinks() {
  return within(screen.getByTestId('app-navigation'))
    .getAllByRole('link')
    .map((link) => [within(link).getByText(/.+/).props.children, link.props.href]);
}

/** The label of a navigation link; the current one is drawn in the full chrome colour. */
const navLabel = (label: string) => within(screen.getByTestId('app-navigation')).getByText(label);

describe('isCurrent', () => {
  it('matches home only on the root path', () => {
    expect(isCurrent('/', '/')).toBe(true);
    expect(isCurrent('/', '/rider')).toBe(false);
  });

  it('matches a section on its own path and below it, not on a longer sibling', () => {
    expect(isCurrent('/rider', '/rider')).toBe(true);
    expect(isCurrent('/rider', '/rider/bikes')).toBe(true);
    expect(isCurrent('/rider', '/riders')).toBe(false);
  });
});

describe('currentHref', () => {
  it('picks the deepest section that contains the path', () => {
    expect(currentHref(ITEMS, '/admin/users')).toBe('/admin/users');
    expect(currentHref(ITEMS, '/admin')).toBe('/admin');
    expect(currentHref(ITEMS, '/admin/outbox')).toBe('/admin');
    expect(currentHref(ITEMS, '/')).toBeUndefined();
  });
});

const GROUPED: readonly NavItem[] = [
  { href: '/admin', label: 'Shop', group: 'Shop admin' },
  { href: '/admin/users', label: 'Users', group: 'Shop admin' },
  { href: '/desk', label: 'Quotes', group: 'Service desk' },
  { href: '/desk/customers', label: 'Customers', group: 'Service desk' },
];

/** Per section: its open items' labels, or the one link a closed group becomes. */
const shown = (current: string | undefined) =>
  visibleNav(GROUPED, current).map(({ open, closed }) => [...open.items, ...closed].map((item) => `${item.label} ${item.href}`));

describe('visibleNav', () => {
  it('opens the group that holds the current page and folds each other group into one link to its first page', () => {
    expect(shown('/desk/customers')).toEqual([['Shop admin /admin'], ['Quotes /desk', 'Customers /desk/customers']]);
    expect(shown('/admin/users')).toEqual([['Shop /admin', 'Users /admin/users'], ['Service desk /desk']]);
  });

  it('opens the first group when no page of any is current', () => {
    expect(shown(undefined)).toEqual([['Shop /admin', 'Users /admin/users'], ['Service desk /desk']]);
  });

  it('shows every item when there are no groups', () => {
    expect(visibleNav(ITEMS, '/desk').flatMap(({ open, closed }) => [...open.items, ...closed])).toEqual(ITEMS);
  });
});

describe('AppFrame', () => {
  afterEach(() => {
    // Here rather than at the top level so it runs before RNTL's cleanup: renderRouter
    // switches to fake timers, and that cleanup needs real ones to finish.
    jest.useRealTimers();
    mockIsWide = true;
  });

  it.each([
    ['wide', true],
    ['phone', false],
  ])('on a %s window links every item it is given, in order, around the page', (_, wide) => {
    mockIsWide = wide;
    renderFrame('/admin');
    expect(navLinks()).toEqual([
      ['Shop', '/admin'],
      ['Users', '/admin/users'],
      ['Quotes', '/desk'],
    ]);
    expect(screen.getByTestId('app-main')).toHaveTextContent('Shop page');
  });

  it('with groups, heads the open group in the side column and links the others by their names', () => {
    renderFrame('/admin/users', undefined, GROUPED);
    expect(navLinks()).toEqual([
      ['Shop', '/admin'],
      ['Users', '/admin/users'],
      ['Service desk', '/desk'],
    ]);
    expect(within(screen.getByTestId('app-navigation')).getByText('Shop admin')).toBeOnTheScreen();
    expect(navLabel('Users')).toHaveStyle({ color: colors.onChrome });
  });

  it('marks one section as current: the deepest that holds the page', () => {
    renderFrame('/admin/users');
    expect(navLabel('Users')).toHaveStyle({ color: colors.onChrome });
    expect(navLabel('Shop')).toHaveStyle({ color: colors.onChromeMuted });
    expect(navLabel('Quotes')).toHaveStyle({ color: colors.onChromeMuted });
  });

  it('shows the tagline in the side column only', () => {
    const wide = renderFrame('/');
    expect(screen.getByText('Suspension set-up')).toBeOnTheScreen();
    wide.unmount();
    mockIsWide = false;
    renderFrame('/');
    expect(screen.queryByText('Suspension set-up')).toBeNull();
    expect(screen.getByText('Home page')).toBeOnTheScreen();
  });

  it.each([
    ['wide', true],
    ['phone', false],
  ])('on a %s window names the signed-in person and signs them out', async (_, wide) => {
    mockIsWide = wide;
    const onSignOut = jest.fn(async () => {});
    renderFrame('/admin', { name: 'Ada Brennick', role: 'Admin', onSignOut });
    expect(within(screen.getByTestId('app-account')).getByText('Ada Brennick')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Sign out' }));
    expect(onSignOut).toHaveBeenCalledTimes(1);
    expect(await screen.findByRole('button', { name: 'Signing out…' })).toBeDisabled();
  });

  it('says so when the sign-out did not happen, and offers it again', async () => {
    const onSignOut = jest.fn(async () => {
      throw new Error('Could not reach the server. Check the connection and try again.');
    });
    renderFrame('/admin', { name: 'Ada Brennick', role: 'Admin', onSignOut });
    fireEvent.press(screen.getByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(/Could not reach the server/);
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeEnabled();
  });

  it('has no account corner while nobody is signed in', () => {
    renderFrame('/');
    expect(screen.queryByTestId('app-account')).toBeNull();
    expect(screen.queryByRole('button', { name: 'Sign out' })).toBeNull();
  });
});
