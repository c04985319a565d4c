import { Slot } from 'expo-router';
import { renderRouter } from 'expo-router/testing-library';
import { Text } from 'react-native';

import { AppFrame, isCurrent, type NavItem } from '@/components/ui/app-frame';

import { getAllByRole, textOf } from '../../helpers/web-queries';

let mockIsWide = true;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const ITEMS: readonly NavItem[] = [
  { href: '/', label: 'Home' },
  { href: '/rider', label: 'Garage' },
];

function renderFrame(initialUrl: string) {
  return renderRouter(
    {
      _layout: () => (
        <AppFrame items={ITEMS}>
          <Slot />
        </AppFrame>
      ),
      index: () => <Text>Home page</Text>,
      'rider/index': () => <Text>Garage page</Text>,
      'rider/bikes': () => <Text>Bikes page</Text>,
    },
    { initialUrl },
  );
}

/** The links inside the navigation landmark, as label, target and whether it is the current one. */
function navLinks() {
  const [nav] = getAllByRole('navigation');
  return nav
    .findAll((node) => node.type === 'a')
    .map((a) => [textOf(a), a.props.href, a.props['aria-current'] === 'page'] as const);
}

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
  ])('on a %s window links every item it is given, in order', (_, wide) => {
    mockIsWide = wide;
    renderFrame('/');
    expect(getAllByRole('navigation')).toHaveLength(1);
    expect(navLinks()).toEqual([
      ['Home', '/', true],
      ['Garage', '/rider', false],
    ]);
    expect(getAllByRole('main').map(textOf)).toEqual(['Home page']);
  });

  it('marks the section of a nested page as current', () => {
    renderFrame('/rider/bikes');
    expect(navLinks()).toEqual([
      ['Home', '/', false],
      ['Garage', '/rider', true],
    ]);
  });

  it('shows the tagline in the side column only', () => {
    const wide = renderFrame('/');
    expect(textOf(wide.UNSAFE_root)).toContain('Suspension set-up');
    wide.unmount();
    mockIsWide = false;
    const phone = renderFrame('/');
    expect(textOf(phone.UNSAFE_root)).not.toContain('Suspension set-up');
    expect(textOf(phone.UNSAFE_root)).toContain('Home page');
  });
});
