/**
 * The admin's two switches on an account, its role and whether it may sign in, shared by the
 * table rows and the phone cards. Each change waits for the server, which alone decides (it
 * refuses, say, to take the admin role from the admin making the change); its refusal is shown
 * beside the account it concerns.
 */
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/api/client';
import { Button } from '@/components/ui/button';
import { SegmentedChoice, type Choice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useUserChanges } from '@/hooks/use-users';
import { useTheme } from '@/theme';
import type { AccountUser } from '@shared/types/account';
import { ROLES, type Role } from '@shared/types/roles';

/** Short names, so all four fit side by side on a phone. */
export const ROLE_CHOICES: readonly Choice<Role>[] = ROLES.map((role) => ({
  value: role,
  label: role.charAt(0).toUpperCase() + role.slice(1),
}));

export type AccountChange = {
  busy: boolean;
  /** The server's reason the last change did not happen. */
  error: string | undefined;
  changeRole: (role: Role) => void;
  toggleActive: () => void;
};

/** One account's changes, one at a time. */
export function useAccountChange(user: AccountUser): AccountChange {
  const changes = useUserChanges();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string>();

  const run = async (request: () => Promise<unknown>) => {
    setBusy(true);
    setError(undefined);
    try {
      await request();
    } catch (cause) {
      setError(cause instanceof ApiError ? cause.message : 'The change did not go through; try again.');
    } finally {
      setBusy(false);
    }
  };

  return {
    busy,
    error,
    changeRole: (role) => void run(() => changes.changeRole(user.id, role)),
    toggleActive: () => void run(() => changes.setActive(user.id, !user.active)),
  };
}

export function RolePicker({ user, change }: { user: AccountUser; change: AccountChange }) {
  return (
    <SegmentedChoice
      label={`Role of ${user.name}`}
      options={ROLE_CHOICES}
      value={user.role}
      disabled={change.busy}
      onChange={change.changeRole}
    />
  );
}

/** Whether the account may sign in, and the button that turns it the other way. */
export function ActiveSwitch({ user, change }: { user: AccountUser; change: AccountChange }) {
  const { colors, radii, spacing } = useTheme();
  return (
    <View style={[styles.row, { gap: spacing.md }]}>
      <View style={[styles.row, { gap: spacing.xs }]}>
        <View
          style={[
            styles.dot,
            { borderRadius: radii.pill, backgroundColor: user.active ? colors.success : colors.textMuted },
          ]}
        />
        <ThemedText type="caption" color={user.active ? 'text' : 'textMuted'}>
          {user.active ? 'Active' : 'Switched off'}
        </ThemedText>
      </View>
      <Button
        variant="secondary"
        label={user.active ? 'Switch off' : 'Switch on'}
        accessibilityLabel={`${user.active ? 'Switch off' : 'Switch on'} ${user.name}`}
        disabled={change.busy}
        onPress={change.toggleActive}
      />
    </View>
  );
}

export function ChangeError({ change }: { change: AccountChange }) {
  if (!change.error) return null;
  return (
    <ThemedText type="caption" color="danger" role="alert">
      {change.error}
    </ThemedText>
  );
}

/** "2 Dec 2025", or "never" before the first sign-in. */
export function formatSignIn(iso: string | null): string {
  if (!iso) return 'never';
  return new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
  dot: { width: 8, height: 8 },
});
