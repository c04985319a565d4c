/**
 * Queries for components rendered under jest-expo/web. There react-native-web turns each
 * component into a DOM-like host element (`h1`, `div`, `data-testid`, inline `style`), which
 * React Native Testing Library's text, role and test-id queries do not recognise: they look
 * for native host names such as `Text`. These helpers walk RNTL's rendered tree instead.
 */
import { screen } from '@testing-library/react-native';
import type { ReactTestInstance } from 'react-test-renderer';

// RNTL 13 renders through react-test-renderer, which React 19 flags as deprecated on every
// render; that one known message would bury real errors in the output.
const consoleError = console.error;
console.error = (...args: unknown[]) => {
  if (typeof args[0] === 'string' && args[0].startsWith('react-test-renderer is deprecated')) return;
  consoleError(...args);
};

type Matcher = string | RegExp;

function hostNodes(root: ReactTestInstance = screen.UNSAFE_root): ReactTestInstance[] {
  return root.findAll((node) => typeof node.type === 'string');
}

function matches(value: string, matcher: Matcher): boolean {
  return typeof matcher === 'string' ? value === matcher : matcher.test(value);
}

function only(found: ReactTestInstance[], what: string): ReactTestInstance {
  if (found.length !== 1) throw new Error(`Expected one element ${what}, found ${found.length}`);
  return found[0];
}

/** All the text inside a node, as a reader would see it. */
export function textOf(node: ReactTestInstance): string {
  return node.children
    .map((child) => (typeof child === 'string' ? child : textOf(child)))
    .join('');
}

export function getByTestId(id: string, root?: ReactTestInstance): ReactTestInstance {
  return only(
    hostNodes(root).filter((node) => node.props['data-testid'] === id),
    `with data-testid "${id}"`,
  );
}

export function getAllByRole(role: string, root?: ReactTestInstance): ReactTestInstance[] {
  return hostNodes(root).filter((node) => node.props.role === role);
}

/** The innermost host elements whose own text matches. */
export function queryAllByText(matcher: Matcher, root?: ReactTestInstance): ReactTestInstance[] {
  return hostNodes(root).filter(
    (node) =>
      matches(textOf(node), matcher) &&
      !node.children.some((child) => typeof child !== 'string' && matches(textOf(child), matcher)),
  );
}

export function getByText(matcher: Matcher, root?: ReactTestInstance): ReactTestInstance {
  return only(queryAllByText(matcher, root), `with text ${String(matcher)}`);
}

/**
 * Presses the nearest enclosing pressable. RNTL's fireEvent.press cannot be used here: it
 * checks pointer events through the native StyleSheet, which is not loaded under the web preset.
 */
export function press(node: ReactTestInstance): void {
  for (let current: ReactTestInstance | null = node; current; current = current.parent) {
    if (typeof current.props.onPress === 'function') {
      if (current.props.disabled) throw new Error('The pressable is disabled');
      current.props.onPress({});
      return;
    }
  }
  throw new Error('No pressable encloses this element');
}

/** The nearest enclosing host element of a tag (`a`, `nav`…), or null. */
export function closest(node: ReactTestInstance, tag: string): ReactTestInstance | null {
  for (let current = node.parent; current; current = current.parent) {
    if (current.type === tag) return current;
  }
  return null;
}
