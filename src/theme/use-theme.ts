import { theme, type Theme } from './tokens';

/**
 * The theme for a component. Light only for now; reading it through a hook keeps
 * components unchanged when a second scheme arrives.
 */
export function useTheme(): Theme {
  return theme;
}
