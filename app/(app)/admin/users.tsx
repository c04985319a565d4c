import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Input } from '@/components/ui/input';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { StaffAccountForm } from '@/components/users/staff-account-form';
import { UserCards } from '@/components/users/user-cards';
import { UserTable } from '@/components/users/user-table';
import { useUsers } from '@/hooks/use-users';
import { ROLE_LABELS } from '@/session/access';
import { useSignedInUser } from '@/session/session-provider';
import { useLayout, useTheme } from '@/theme';
import type { UserSearchInput } from '@shared/schemas/auth.schema';
import type { AccountUser } from '@shared/types/account';

const PAGE_SIZE = 20;

export default function UsersScreen() {
  const me = useSignedInUser();
  const [search, setSearch] = useState<UserSearchInput>({ q: '', page: 1, pageSize: PAGE_SIZE });
  const [creating, setCreating] = useState(false);
  const [created, setCreated] = useState<AccountUser>();

  return (
    <Screen width="table">
      <ThemedText type="title">Users</ThemedText>
      <ThemedText color="textMuted">
        Everyone who may sign in, with their role. A switched-off account cannot sign in, and any
        session it had ends at once.
      </ThemedText>

      {created && (
        <Card tone="success">
          <ThemedText role="status">
            {`Created ${created.name}'s account (${ROLE_LABELS[created.role]}, ${created.email}).`}
          </ThemedText>
        </Card>
      )}
      {creating ? (
        <Card>
          <ThemedText type="heading">New staff account</ThemedText>
          <StaffAccountForm
            onCreated={(user) => {
              setCreated(user);
              setCreating(false);
            }}
            onCancel={() => setCreating(false)}
          />
        </Card>
      ) : (
        <Button
          label="Create a staff account"
          onPress={() => {
            setCreated(undefined);
            setCreating(true);
          }}
        />
      )}

      <SearchBar onSearch={(q) => setSearch({ q, page: 1, pageSize: PAGE_SIZE })} />
      <UserResults search={search} selfId={me.id} onPage={(page) => setSearch({ ...search, page })} />
    </Screen>
  );
}

/** Searches on Enter or the button, not on every key: each search is a request. */
function SearchBar({ onSearch }: { onSearch: (q: string) => void }) {
  const { spacing } = useTheme();
  const [text, setText] = useState('');
  return (
    <View style={[styles.searchRow, { gap: spacing.sm }]}>
      <Input
        accessibilityLabel="Search accounts"
        placeholder="Name or e-mail"
        value={text}
        onChangeText={setText}
        onSubmitEditing={() => onSearch(text.trim())}
        autoCapitalize="none"
        autoCorrect={false}
        inputMode="search"
        style={styles.searchInput}
      />
      <Button variant="secondary" label="Search" onPress={() => onSearch(text.trim())} />
    </View>
  );
}

type UserResultsProps = {
  search: UserSearchInput;
  selfId: number;
  onPage: (page: number) => void;
};

function UserResults({ search, selfId, onPage }: UserResultsProps) {
  const { isWide } = useLayout();
  const { spacing } = useTheme();
  const { data, error, isLoading, isValidating, mutate } = useUsers(search);

  if (error && !data) {
    return (
      <ErrorState
        title="The accounts could not be loaded"
        message={error.message}
        onRetry={() => void mutate()}
        retrying={isValidating}
      />
    );
  }
  if (!data) return <LoadingState label="Loading the accounts…" />;
  if (data.users.length === 0) {
    return (
      <EmptyState title={search.q ? `No account matches “${search.q}”.` : 'No accounts yet.'}>
        {search.q ? 'Try part of the name or of the e-mail address.' : undefined}
      </EmptyState>
    );
  }

  const pages = Math.max(1, Math.ceil(data.total / data.pageSize));
  return (
    <>
      {error && <ErrorState title="The list could not be brought up to date" message={error.message} />}
      {isWide ? <UserTable users={data.users} selfId={selfId} /> : <UserCards users={data.users} selfId={selfId} />}
      <View style={[styles.pager, { gap: spacing.md }]}>
        <Button
          variant="secondary"
          label="Previous"
          disabled={data.page <= 1 || isLoading}
          onPress={() => onPage(data.page - 1)}
        />
        <ThemedText color="textMuted" aria-live="polite">
          {`Page ${data.page} of ${pages} · ${data.total} ${data.total === 1 ? 'account' : 'accounts'}`}
        </ThemedText>
        <Button
          variant="secondary"
          label="Next"
          disabled={data.page >= pages || isLoading}
          onPress={() => onPage(data.page + 1)}
        />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  searchRow: { flexDirection: 'row', alignItems: 'center' },
  searchInput: { flex: 1 },
  pager: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
});
