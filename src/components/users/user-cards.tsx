import { View } from 'react-native';

import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { AccountUser } from '@shared/types/account';

import { ActiveSwitch, ChangeError, RolePicker, formatSignIn, useAccountChange } from './account-controls';
import type { UserListProps } from './user-table';

/** The accounts as a stack of cards, for a phone: each control gets the full width. */
export function UserCards({ users, selfId }: UserListProps) {
  const { spacing } = useTheme();
  return (
    <View role="list" aria-label="Accounts" style={{ gap: spacing.md }}>
      {users.map((user) => (
        <UserCard key={user.id} user={user} isSelf={user.id === selfId} />
      ))}
    </View>
  );
}

function UserCard({ user, isSelf }: { user: AccountUser; isSelf: boolean }) {
  const { spacing } = useTheme();
  const change = useAccountChange(user);
  return (
    <View role="listitem" testID={`user-card-${user.id}`}>
      <Card>
        <View>
          <ThemedText type="bodyStrong">
            {user.name}
            {isSelf ? ' (you)' : ''}
          </ThemedText>
          <ThemedText type="caption" color="textMuted">
            {user.email}
          </ThemedText>
          <ThemedText type="caption" color="textMuted">
            Last signed in: {formatSignIn(user.lastSignInAt)}
          </ThemedText>
        </View>
        <View style={{ gap: spacing.md }}>
          <RolePicker user={user} change={change} />
          <ActiveSwitch user={user} change={change} />
        </View>
        <ChangeError change={change} />
      </Card>
    </View>
  );
}
