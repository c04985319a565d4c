/**
 * Design tokens: the only place that holds raw colours, font names and sizes.
 * Components read the semantic `colors`, never the `palette`, so a hue can be
 * retuned in one line. See README.md in this folder for the naming rules.
 */
import { Platform, type TextStyle } from 'react-native';

/** Raw hues, named for what they look like. */
export const palette = {
  ink: '#1E2733',
  slate: '#545C68',
  paper: '#F5EFE3',
  cream: '#FFFBF4',
  sand: '#E2D8C6',
  rust: '#B3441B',
  rustPale: '#F6DDD0',
  ember: '#F0A679',
  pine: '#2F6B45',
  pinePale: '#DDEEDF',
  ochre: '#8A5B0A',
  ochrePale: '#FBEBCB',
  brick: '#A3282C',
  brickPale: '#F8DEDA',
  inkRaised: '#2C3746',
  fog: '#B9C0CA',
  linen: '#E9E1D1',
  white: '#FFFFFF',
} as const;

/** Colours by role. Every text/background pair here meets WCAG AA (4.5:1). */
export const colors = {
  text: palette.ink,
  textMuted: palette.slate,
  background: palette.paper,
  surface: palette.cream,
  border: palette.sand,
  accent: palette.rust,
  accentSoft: palette.rustPale,
  onAccent: palette.white,
  success: palette.pine,
  successSoft: palette.pinePale,
  warning: palette.ochre,
  warningSoft: palette.ochrePale,
  danger: palette.brick,
  dangerSoft: palette.brickPale,
  /** The frame around content: the side column on wide windows, the top bar on phones. */
  chrome: palette.ink,
  chromeRaised: palette.inkRaised,
  onChrome: palette.linen,
  onChromeMuted: palette.fog,
  chromeAccent: palette.ember,
} as const;

export type ColorName = keyof typeof colors;

/**
 * Names the faces are registered under with expo-font (the fonts' own full names).
 * app/_layout.tsx loads one file per name from fonts/.
 */
export const fontFaces = {
  sans: 'Figtree',
  sansSemiBold: 'Figtree SemiBold',
  mono: 'Azeret Mono',
  monoMedium: 'Azeret Mono Medium',
} as const;

export type FontFace = keyof typeof fontFaces;

/**
 * What styles use. On the web a fallback stack keeps text legible if a face fails to load;
 * native platforms accept only a single registered name.
 */
export const fonts: Record<FontFace, string> = Platform.select({
  web: {
    sans: `"${fontFaces.sans}", system-ui, sans-serif`,
    sansSemiBold: `"${fontFaces.sansSemiBold}", system-ui, sans-serif`,
    mono: `"${fontFaces.mono}", ui-monospace, monospace`,
    monoMedium: `"${fontFaces.monoMedium}", ui-monospace, monospace`,
  },
  default: fontFaces,
});

/**
 * Text styles, one per `type` of ThemedText. Weight comes from the face alone: setting
 * fontWeight as well would make browsers embolden an already bold face.
 */
export const typography = {
  title: { fontFamily: fonts.sansSemiBold, fontSize: 32, lineHeight: 38, letterSpacing: -0.5 },
  heading: { fontFamily: fonts.sansSemiBold, fontSize: 21, lineHeight: 28 },
  body: { fontFamily: fonts.sans, fontSize: 16, lineHeight: 24 },
  bodyStrong: { fontFamily: fonts.sansSemiBold, fontSize: 16, lineHeight: 24 },
  label: { fontFamily: fonts.sansSemiBold, fontSize: 15, lineHeight: 20 },
  caption: { fontFamily: fonts.sans, fontSize: 13, lineHeight: 18 },
  overline: {
    fontFamily: fonts.sansSemiBold,
    fontSize: 12,
    lineHeight: 16,
    letterSpacing: 1.2,
    textTransform: 'uppercase',
  },
  /** Measurements: a monospaced face, so digits line up in columns. */
  figure: { fontFamily: fonts.mono, fontSize: 15, lineHeight: 22, fontVariant: ['tabular-nums'] },
  figureLarge: {
    fontFamily: fonts.monoMedium,
    fontSize: 28,
    lineHeight: 34,
    fontVariant: ['tabular-nums'],
  },
} satisfies Record<string, TextStyle>;

export type TextType = keyof typeof typography;

/** Spacing steps in px; layouts use these, not ad-hoc numbers. */
export const spacing = {
  xxs: 2,
  xs: 4,
  sm: 8,
  md: 12,
  lg: 16,
  xl: 24,
  xxl: 32,
  xxxl: 48,
} as const;

export type SpaceStep = keyof typeof spacing;

export const radii = {
  sm: 6,
  md: 10,
  lg: 16,
  pill: 999,
} as const;

export type Radius = keyof typeof radii;

/** Minimum window widths in px. */
export const breakpoints = {
  wide: 900,
} as const;

export type Breakpoint = keyof typeof breakpoints;

/** Fixed measures of the layout. */
export const sizes = {
  /** A readable line length for the content column on wide windows. */
  contentMaxWidth: 720,
  /** The content column of screens that lay out tables. */
  wideContentMaxWidth: 1040,
  sideNavWidth: 248,
  topBarHeight: 56,
  /** Smallest comfortable touch target. */
  touchTarget: 44,
} as const;

export const theme = {
  palette,
  colors,
  fonts,
  typography,
  spacing,
  radii,
  breakpoints,
  sizes,
} as const;

export type Theme = typeof theme;
