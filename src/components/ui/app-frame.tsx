import { Link, usePathname, type Href } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View, type PressableProps } from 'react-native';

import { useLayout, useTheme } from '@/theme';

import { BrandMark } from './brand-mark';
import { ThemedText } from './themed-text';

export type NavItem = {
  href: Extract<Href, string>;
  label: string;
};

export type AppFrameProps = {
  /** The destinations this person may reach; each role area adds its own. */
  items: readonly NavItem[];
  children: ReactNode;
};

/** A section is current on its own path and on every path below it. */
export function isCurrent(href: string, pathname: string): boolean {
  if (href === '/') return pathname === '/';
  return pathname === href || pathname.startsWith(`${href}/`);
}

/**
 * The frame around every screen: a side column of navigation on wide windows,
 * a compact top bar on phones.
 */
export function AppFrame({ items, children }: AppFrameProps) {
  const { isWide } = useLayout();
  const { colors, sizes, spacing } = useTheme();
  const pathname = usePathname();

  if (isWide) {
    return (
      <View style={[styles.row, { backgroundColor: colors.background }]}>
        <View
          style={{
            width: sizes.sideNavWidth,
            backgroundColor: colors.chrome,
            paddingVertical: spacing.xl,
            paddingHorizontal: spacing.md,
            gap: spacing.xxl,
          }}
        >
          <Brand showTagline />
          <View role="navigation" style={{ gap: spacing.xxs }}>
            {items.map((item) => (
              <NavLink
                key={item.href}
                item={item}
                current={isCurrent(item.href, pathname)}
                placement="side"
              />
            ))}
          </View>
        </View>
        <View role="main" style={styles.fill}>
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={[styles.fill, { backgroundColor: colors.background }]}>
      <View
        style={[
          styles.topBar,
          {
            height: sizes.topBarHeight,
            backgroundColor: colors.chrome,
            paddingHorizontal: spacing.lg,
            gap: spacing.lg,
          },
        ]}
      >
        <Brand />
        <View role="navigation" style={[styles.topNav, { gap: spacing.xs }]}>
          {items.map((item) => (
            <NavLink
              key={item.href}
              item={item}
              current={isCurrent(item.href, pathname)}
              placement="top"
            />
          ))}
        </View>
      </View>
      <View role="main" style={styles.fill}>
        {children}
      </View>
    </View>
  );
}

/*
 * `<Link asChild>` merges its props into its child by spreading `style` as an object, which
 * breaks style arrays and style functions. So each link wraps a component of ours that
 * builds its own style, never a bare Pressable.
 */

function Brand({ showTagline = false }: { showTagline?: boolean }) {
  return (
    <Link href="/" asChild>
      <BrandPressable showTagline={showTagline} />
    </Link>
  );
}

type BrandPressableProps = PressableProps & { showTagline: boolean };

function BrandPressable({ showTagline, ...rest }: BrandPressableProps) {
  const { spacing } = useTheme();
  return (
    <Pressable
      accessibilityLabel="Sagwright, home"
      {...rest}
      style={[styles.brand, { gap: spacing.sm, paddingHorizontal: showTagline ? spacing.sm : 0 }]}
    >
      <BrandMark size={showTagline ? 36 : 30} />
      <View>
        <ThemedText type="heading" color="onChrome" accessibilityRole="text">
          Sagwright
        </ThemedText>
        {showTagline && (
          <ThemedText type="caption" color="onChromeMuted">
            Suspension set-up
          </ThemedText>
        )}
      </View>
    </Pressable>
  );
}

type NavPlacement = 'side' | 'top';

type NavLinkProps = { item: NavItem; current: boolean; placement: NavPlacement };

function NavLink({ item, current, placement }: NavLinkProps) {
  return (
    <Link href={item.href} asChild>
      <NavPressable label={item.label} current={current} placement={placement} />
    </Link>
  );
}

/**
 * How the web marks the link to the page being shown. React Native's types do not list
 * `aria-current`; react-native-web passes it through to the anchor.
 */
const CURRENT_PAGE = { 'aria-current': 'page' } as PressableProps;

type NavPressableProps = PressableProps & {
  label: string;
  current: boolean;
  placement: NavPlacement;
};

function NavPressable({ label, current, placement, ...rest }: NavPressableProps) {
  const { colors, radii, spacing, sizes } = useTheme();
  return (
    <Pressable
      {...(current && CURRENT_PAGE)}
      {...rest}
      style={({ pressed }) =>
        placement === 'side'
          ? [
              styles.sideLink,
              {
                minHeight: sizes.touchTarget,
                paddingHorizontal: spacing.md,
                borderRadius: radii.sm,
                borderLeftColor: current ? colors.chromeAccent : 'transparent',
                backgroundColor: current || pressed ? colors.chromeRaised : 'transparent',
              },
            ]
          : [
              styles.topLink,
              {
                minHeight: sizes.touchTarget,
                paddingHorizontal: spacing.sm,
                borderBottomColor: current ? colors.chromeAccent : 'transparent',
              },
            ]
      }
    >
      <ThemedText type="label" color={current ? 'onChrome' : 'onChromeMuted'}>
        {label}
      </ThemedText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  row: { flex: 1, flexDirection: 'row' },
  topBar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
  topNav: { flexDirection: 'row', alignItems: 'center' },
  brand: { flexDirection: 'row', alignItems: 'center' },
  sideLink: { justifyContent: 'center', borderLeftWidth: 3 },
  topLink: { justifyContent: 'center', borderBottomWidth: 3 },
});
