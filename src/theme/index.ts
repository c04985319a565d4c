export * from './tokens';
export { useTheme } from './use-theme';
export { useLayout, type Layout } from './use-layout';
