import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { AccountUser } from '@shared/types/account';

import { ActiveSwitch, ChangeError, RolePicker, formatSignIn, useAccountChange } from './account-controls';

export type UserListProps = {
  users: readonly AccountUser[];
  /** The admin looking at the list, marked as "you". */
  selfId: number;
};

/** The accounts as a table, for a wide window: one row each, the controls in their own columns. */
export function UserTable({ users, selfId }: UserListProps) {
  const { colors, radii, spacing } = useTheme();
  return (
    <View
      role="table"
      aria-label="Accounts"
      style={[styles.table, { borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surface }]}
    >
      <View
        role="row"
        style={[styles.row, styles.rowBlock, { padding: spacing.md, gap: spacing.lg, borderBottomColor: colors.border }]}
      >
        <HeaderCell style={styles.account}>Account</HeaderCell>
        <HeaderCell style={styles.role}>Role</HeaderCell>
        <HeaderCell style={styles.status}>Sign-in</HeaderCell>
      </View>
      {users.map((user) => (
        <UserRow key={user.id} user={user} isSelf={user.id === selfId} />
      ))}
    </View>
  );
}

function HeaderCell({ children, style }: { children: string; style: StyleProp<ViewStyle> }) {
  return (
    <View role="columnheader" style={style}>
      <ThemedText type="overline" color="textMuted">
        {children}
      </ThemedText>
    </View>
  );
}

function UserRow({ user, isSelf }: { user: AccountUser; isSelf: boolean }) {
  const { colors, spacing } = useTheme();
  const change = useAccountChange(user);
  return (
    <View
      role="row"
      testID={`user-row-${user.id}`}
      style={[styles.rowBlock, { padding: spacing.md, gap: spacing.xs, borderBottomColor: colors.border }]}
    >
      <View style={[styles.row, { gap: spacing.lg }]}>
        <View role="cell" style={styles.account}>
          <ThemedText type="bodyStrong" numberOfLines={1}>
            {user.name}
            {isSelf ? ' (you)' : ''}
          </ThemedText>
          <ThemedText type="caption" color="textMuted" numberOfLines={1}>
            {user.email}
          </ThemedText>
          <ThemedText type="caption" color="textMuted">
            Last signed in: {formatSignIn(user.lastSignInAt)}
          </ThemedText>
        </View>
        <View role="cell" style={styles.role}>
          <RolePicker user={user} change={change} />
        </View>
        <View role="cell" style={styles.status}>
          <ActiveSwitch user={user} change={change} />
        </View>
      </View>
      <ChangeError change={change} />
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center' },
  rowBlock: { borderBottomWidth: 1 },
  account: { flex: 1, minWidth: 0 },
  role: { width: 330 },
  status: { width: 220 },
});
