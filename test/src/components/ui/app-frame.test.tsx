import { Slot } from 'expo-router';
import { renderRouter, screen } from 'expo-router/testing-library';
import { within } from '@testing-library/react-native';
import { Text } from 'react-native';

import { AppFrame, isCurrent, type NavItem } from '@/components/ui/app-frame';

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

/** The links inside the navigation, as label and target. */
function navLinks() {
  return within(screen.getByTestId('app-navigation'))
    .getAllByRole('link')
    .map((link) => [within(link).getByText(/./).props.children, link.props.href]);
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
    expect(navLinks()).toEqual([
      ['Home', '/'],
      ['Garage', '/rider'],
    ]);
    expect(screen.getByTestId('app-main')).toHaveTextContent('Home page');
  });

  it('shows the page of a nested address inside the frame', () => {
    renderFrame('/rider/bikes');
    expect(screen.getByTestId('app-main')).toHaveTextContent('Bikes page');
    expect(navLinks()).toHaveLength(2);
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
});
