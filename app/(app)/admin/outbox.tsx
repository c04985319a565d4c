import { router, useLocalSearchParams } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { MailText } from '@/components/outbox/mail-text';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useOutbox, useOutboxMail, type OutboxEntry } from '@/hooks/use-outbox';
import { useLayout, useTheme } from '@/theme';
import type { ApiError } from '@/api/client';

/**
 * The mails a development server caught instead of sending. The open mail is in the address
 * (`?mail=<id>`), so the browser's back button closes it. Side by side on a wide window; on a
 * phone the open mail takes the screen.
 */
export default function OutboxScreen() {
  const { mail: openId } = useLocalSearchParams<{ mail?: string }>();
  const { isWide } = useLayout();
  const { spacing } = useTheme();
  const open = (id: string | undefined) => router.setParams({ mail: id });

  return (
    <Screen width="table">
      <ThemedText type="title">Outbox</ThemedText>
      <ThemedText color="textMuted">
        Development only: the mails the app would have sent, such as password-reset links, kept by
        the server instead of going out.
      </ThemedText>
      {isWide ? (
        <View style={[styles.columns, { gap: spacing.xl }]}>
          <View style={styles.list}>
            <MailList openId={openId} onOpen={open} />
          </View>
          <View style={styles.reader}>
            {openId ? (
              <MailReader id={openId} />
            ) : (
              <EmptyState title="No mail open">Choose a mail on the left to read it.</EmptyState>
            )}
          </View>
        </View>
      ) : openId ? (
        <>
          <Button variant="secondary" label="All mails" onPress={() => open(undefined)} />
          <MailReader id={openId} />
        </>
      ) : (
        <MailList openId={openId} onOpen={open} />
      )}
    </Screen>
  );
}

/** A 404 here means the server runs in production, where the outbox does not exist. */
function explain(error: ApiError): string {
  return error.status === 404 && error.code === 'not-found'
    ? 'This server sends real mail, so it keeps no outbox.'
    : error.message;
}

function MailList({ openId, onOpen }: { openId: string | undefined; onOpen: (id: string) => void }) {
  const { spacing } = useTheme();
  const { data, error, isValidating, mutate } = useOutbox();

  if (error) {
    return (
      <ErrorState
        title="The outbox could not be loaded"
        message={explain(error)}
        onRetry={() => void mutate()}
        retrying={isValidating}
      />
    );
  }
  if (!data) return <LoadingState label="Loading the outbox…" />;
  return (
    <View style={{ gap: spacing.sm }}>
      <Button
        variant="secondary"
        label={isValidating ? 'Checking…' : 'Check for new mail'}
        disabled={isValidating}
        onPress={() => void mutate()}
      />
      {data.length === 0 ? (
        <EmptyState title="No mail yet">A password-reset request puts its mail here.</EmptyState>
      ) : (
        <View role="list" aria-label="Mails" style={{ gap: spacing.sm }}>
          {data.map((mail) => (
            <MailListItem key={mail.id} mail={mail} open={mail.id === openId} onOpen={onOpen} />
          ))}
        </View>
      )}
    </View>
  );
}

type MailListItemProps = { mail: OutboxEntry; open: boolean; onOpen: (id: string) => void };

function MailListItem({ mail, open, onOpen }: MailListItemProps) {
  const { colors, radii, spacing } = useTheme();
  return (
    <View role="listitem">
      <Pressable
        accessibilityRole="button"
        aria-label={`${mail.subject}, to ${mail.to.join(', ')}`}
        onPress={() => onOpen(mail.id)}
        style={({ pressed }) => [
          styles.item,
          {
            padding: spacing.md,
            gap: spacing.xxs,
            borderRadius: radii.md,
            borderColor: open ? colors.text : colors.border,
            backgroundColor: pressed ? colors.accentSoft : colors.surface,
          },
        ]}
      >
        <ThemedText type="bodyStrong" numberOfLines={2}>
          {mail.subject || '(no subject)'}
        </ThemedText>
        <ThemedText type="caption" color="textMuted" numberOfLines={1}>
          {`To ${mail.to.join(', ')} · ${formatWhen(mail.date)}`}
        </ThemedText>
      </Pressable>
    </View>
  );
}

function MailReader({ id }: { id: string }) {
  const { data, error, isValidating, mutate } = useOutboxMail(id);
  if (error) {
    return (
      <ErrorState
        title="This mail could not be opened"
        message={explain(error)}
        onRetry={() => void mutate()}
        retrying={isValidating}
      />
    );
  }
  if (!data) return <LoadingState label="Opening the mail…" />;
  return (
    <Card testID="mail-reader">
      <ThemedText type="heading">{data.subject || '(no subject)'}</ThemedText>
      <ThemedText type="caption" color="textMuted">
        {`From ${data.from}\nTo ${data.to.join(', ')}\n${formatWhen(data.date)}`}
      </ThemedText>
      {data.text ? (
        <MailText text={data.text} />
      ) : (
        <ThemedText color="textMuted">This mail has no plain-text part.</ThemedText>
      )}
    </Card>
  );
}

function formatWhen(iso: string): string {
  return new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', alignItems: 'flex-start' },
  list: { flex: 2 },
  reader: { flex: 3 },
  item: { borderWidth: 1 },
});
