import { Link, usePathname, type Href } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, View, type PressableProps } from 'react-native';

import { useLayout, useTheme } from '@/theme';

import { BrandMark } from './brand-mark';
import { ThemedText } from './themed-text';

export type NavItem = {
  href: Extract<Href, string>;
  label: string;
  /** The area it belongs to, e.g. "Parts counter"; consecutive items of one area form a group. */
  group?: string;
};

/** Consecutive items of one group; `group` is undefined for items given without one. */
export type NavSection = { group: string | undefined; items: NavItem[] };

/** The signed-in person, as the frame shows them. */
export type FrameAccount = {
  name: string;
  /** What kind of account it is, e.g. "Service desk". */
  role: string;
  /** Rejects, with a message to show, when the sign-out did not happen. */
  onSignOut: () => Promise<void>;
};

export type AppFrameProps = {
  /** The destinations this person may reach; each role area adds its own. */
  items: readonly NavItem[];
  /** Absent while nobody is signed in. */
  account?: FrameAccount;
  children: ReactNode;
};

/** A section is current on its own path and on every path below it. */
export function isCurrent(href: string, pathname: string): boolean {
  if (href === '/') return pathname === '/';
  return pathname === href || pathname.startsWith(`${href}/`);
}

/** The one item to mark: of those that are current, the deepest (Users over Shop on /admin/users). */
export function currentHref(items: readonly NavItem[], pathname: string): string | undefined {
  return items
    .filter((item) => isCurrent(item.href, pathname))
    .reduce<string | undefined>((best, item) => (!best || item.href.length > best.length ? item.href : best), undefined);
}

export function navSections(items: readonly NavItem[]): NavSection[] {
  const sections: NavSection[] = [];
  for (const item of items) {
    const last = sections.at(-1);
    if (last && last.group === item.group) last.items.push(item);
    else sections.push({ group: item.group, items: [item] });
  }
  return sections;
}

/**
 * What the navigation shows. With one group every item. With several (an admin reaches the
 * shop, the desk and the counter: a dozen links, more than a laptop's side column holds) only
 * the group being worked in opens to its items, the first group when none is; each other group
 * is one link, named after it, to its first item.
 */
export function visibleNav(items: readonly NavItem[], current: string | undefined): { open: NavSection; closed: NavItem[] }[] {
  const sections = navSections(items);
  if (sections.length < 2) return sections.map((open) => ({ open, closed: [] }));
  const openIndex = Math.max(0, sections.findIndex((section) => section.items.some((item) => item.href === current)));
  return sections.map((section, index) =>
    index === openIndex
      ? { open: section, closed: [] }
      : { open: { group: undefined, items: [] }, closed: [{ href: section.items[0].href, label: section.group ?? section.items[0].label }] },
  );
}

/**
 * The frame around every screen: a side column of navigation on wide windows, a compact top bar
 * over a row of links on phones. The signed-in person's name and the sign-out sit in the side
 * column's foot, or at the right of the top bar.
 */
export function AppFrame({ items, account, children }: AppFrameProps) {
  const { isWide } = useLayout();
  const { colors, sizes, spacing } = useTheme();
  const current = currentHref(items, usePathname());
  const placement: Placement = isWide ? 'side' : 'top';
  const grouped = navSections(items).length > 1;
  const links = visibleNav(items, current).flatMap(({ open, closed }) => [
    ...(grouped && open.group && isWide
      ? [
          <ThemedText key={`group-${open.group}`} type="caption" color="onChromeMuted" style={{ paddingHorizontal: spacing.md, paddingTop: spacing.sm }}>
            {open.group}
          </ThemedText>,
        ]
      : []),
    ...open.items.map((item) => (
      <NavLink key={item.href} item={item} current={item.href === current} placement={placement} nested={grouped && isWide} />
    )),
    ...closed.map((item) => <NavLink key={`closed-${item.href}`} item={item} current={false} placement={placement} />),
  ]);

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
          <View role="navigation" testID="app-navigation" style={[styles.fill, { gap: spacing.xxs }]}>
            {links}
          </View>
          {account && <AccountPanel account={account} placement="side" />}
        </View>
        <View role="main" testID="app-main" style={styles.fill}>
          {children}
        </View>
      </View>
    );
  }

  return (
    <View style={[styles.fill, { backgroundColor: colors.background }]}>
      <View style={{ backgroundColor: colors.chrome, paddingHorizontal: spacing.lg }}>
        <View style={[styles.topBar, { height: sizes.topBarHeight, gap: spacing.md }]}>
          <Brand />
          {account && <AccountPanel account={account} placement="top" />}
        </View>
        <View
          role="navigation"
          testID="app-navigation"
          style={[styles.topNav, { columnGap: spacing.lg }]}
        >
          {links}
        </View>
      </View>
      <View role="main" testID="app-main" style={styles.fill}>
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

type Placement = 'side' | 'top';

/** Who is signed in and the way out. A failed sign-out says so where the button is. */
function AccountPanel({ account, placement }: { account: FrameAccount; placement: Placement }) {
  const { spacing } = useTheme();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();

  const signOut = async () => {
    setBusy(true);
    setError(undefined);
    try {
      await account.onSignOut();
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'Could not sign out; try again.');
      setBusy(false);
    }
  };

  const button = (
    <SignOutButton label={busy ? 'Signing out…' : 'Sign out'} disabled={busy} onPress={signOut} />
  );
  const failure = error && (
    <ThemedText type="caption" color="chromeAccent" role="alert">
      {error}
    </ThemedText>
  );

  if (placement === 'side') {
    return (
      <View testID="app-account" style={{ gap: spacing.sm, paddingHorizontal: spacing.sm }}>
        <View>
          <ThemedText type="caption" color="onChromeMuted">
            Signed in as
          </ThemedText>
          <ThemedText type="label" color="onChrome" numberOfLines={2}>
            {account.name}
          </ThemedText>
          <ThemedText type="caption" color="onChromeMuted">
            {account.role}
          </ThemedText>
        </View>
        {button}
        {failure}
      </View>
    );
  }
  return (
    <View testID="app-account" style={[styles.topAccount, { gap: spacing.sm }]}>
      <View style={styles.topAccountText}>
        <ThemedText type="caption" color="onChrome" numberOfLines={1}>
          {account.name}
        </ThemedText>
        {failure}
      </View>
      {button}
    </View>
  );
}

function SignOutButton({ label, ...rest }: PressableProps & { label: string }) {
  const { colors, radii, sizes, spacing } = useTheme();
  return (
    <Pressable
      accessibilityRole="button"
      {...rest}
      style={({ pressed }) => [
        styles.signOut,
        {
          minHeight: sizes.touchTarget,
          paddingHorizontal: spacing.md,
          borderRadius: radii.sm,
          borderColor: colors.onChromeMuted,
          backgroundColor: pressed ? colors.chromeRaised : 'transparent',
          opacity: rest.disabled ? 0.6 : 1,
        },
      ]}
    >
      <ThemedText type="label" color="onChrome" selectable={false}>
        {label}
      </ThemedText>
    </Pressable>
  );
}

type NavLinkProps = { item: NavItem; current: boolean; placement: Placement; nested?: boolean };

function NavLink({ item, current, placement, nested = false }: NavLinkProps) {
  return (
    <Link href={item.href} asChild>
      <NavPressable label={item.label} current={current} placement={placement} nested={nested} />
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
  placement: Placement;
  /** An item under its group's heading, indented beneath it. */
  nested: boolean;
};

function NavPressable({ label, current, placement, nested, ...rest }: NavPressableProps) {
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
                paddingHorizontal: nested ? spacing.lg : spacing.md,
                borderRadius: radii.sm,
                borderLeftColor: current ? colors.chromeAccent : 'transparent',
                backgroundColor: current || pressed ? colors.chromeRaised : 'transparent',
              },
            ]
          : [
              styles.topLink,
              {
                minHeight: sizes.touchTarget,
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
  // Wraps rather than scrolls, so no destination hides beyond the edge of a phone.
  topNav: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center' },
  topAccount: { flexDirection: 'row', alignItems: 'center', flexShrink: 1 },
  topAccountText: { flexShrink: 1, alignItems: 'flex-end' },
  brand: { flexDirection: 'row', alignItems: 'center' },
  sideLink: { justifyContent: 'center', borderLeftWidth: 3 },
  topLink: { justifyContent: 'center', borderBottomWidth: 3 },
  signOut: { alignItems: 'center', justifyContent: 'center', alignSelf: 'flex-start', borderWidth: 1 },
});
