/**
 * The real app/ directory under Expo Router's test renderer, its root layout wrapped in a test
 * SWR cache. Fonts count as loaded at once.
 */
import { renderRouter } from 'expo-router/testing-library';

import RootLayout from '../../app/_layout';
import { TestSWR } from '../src/helpers/swr';

jest.mock('expo-font', () => ({ useFonts: () => [true, null] }));

// The first render loads every route module; on a busy machine that alone can pass Jest's 5 s.
jest.setTimeout(20_000);

function TestRootLayout() {
  return (
    <TestSWR>
      <RootLayout />
    </TestSWR>
  );
}

export function renderApp(initialUrl: string) {
  return renderRouter({ appDir: 'app', overrides: { _layout: TestRootLayout } }, { initialUrl });
}
