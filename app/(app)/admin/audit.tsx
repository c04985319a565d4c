import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { formatMoney } from '@/components/catalogue/money';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useAudit } from '@/hooks/use-audit';
import { useTheme } from '@/theme';
import type { AuditEntry } from '@shared/types/shop-data';
import type { ShopSettingsView } from '@shared/types/quote';

const ENTITIES = [
  { value: 'all', label: 'All' },
  { value: 'bike-model', label: 'Bike models' },
  { value: 'target-profile', label: 'Profiles' },
  { value: 'engine-setting', label: 'Settings' },
  { value: 'shop-settings', label: 'Shop settings' },
] as const;

type EntityChoice = (typeof ENTITIES)[number]['value'];

const ACTIONS = { create: 'created', update: 'changed', delete: 'deleted' } as const;

type Terms = Omit<ShopSettingsView, 'updatedAt'>;

const percent = (basisPoints: number) => `${basisPoints / 100} %`;

/** Each of the shop's terms as the settings screen names it, with its value in words. */
const TERMS: { [K in keyof Terms]: { label: string; show: (value: Terms[K]) => string } } = {
  labourRateCentsPerHour: { label: 'Labour rate', show: (cents) => `${formatMoney(cents)} an hour` },
  taxBasisPoints: { label: 'Tax rate', show: percent },
  deposit: { label: 'Deposit', show: (rule) => (rule.kind === 'percent' ? `${percent(rule.basisPoints)} of the total` : `${formatMoney(rule.cents)} fixed`) },
  operations: { label: 'Operations', show: (list) => list.map((o) => `${o.label} ${o.minutes} min`).join(', ') },
  quoteValidityDays: { label: 'Quotes valid for', show: (days) => `${days} days` },
  cautions: { label: 'Cautions', show: (text) => (text ? `"${text}"` : 'none') },
  // Entries from before the address was a setting have no value: the same as not set.
  publicUrl: { label: 'Public address', show: (url) => url ?? 'not set' },
};

/** What a shop-settings edit changed, one line per term: "Tax rate: 20 % → 21 %". */
function describeTermsChange(entry: AuditEntry): string[] {
  const before = entry.before as Terms | null;
  const after = entry.after as Terms | null;
  if (!after) return [];
  return (Object.keys(TERMS) as (keyof Terms)[]).flatMap((key) => {
    const show = TERMS[key].show as (value: unknown) => string;
    const next = show(after[key]);
    if (!before) return [`${TERMS[key].label}: ${next}`];
    const previous = show(before[key]);
    return previous === next ? [] : [`${TERMS[key].label}: ${previous} → ${next}`];
  });
}

const ENTITY_NAMES: Record<AuditEntry['entity'], (key: string) => string> = {
  'bike-model': (key) => `Bike model ${key}`,
  'target-profile': (key) => `Target profile ${key}`,
  'engine-setting': (key) => `Engine setting ${key}`,
  'shop-settings': () => 'Shop settings',
};

/** Who changed which shop data, when. */
export default function AuditScreen() {
  const { spacing } = useTheme();
  const [entity, setEntity] = useState<EntityChoice>('all');
  const [page, setPage] = useState(1);
  const { data, error, mutate } = useAudit(entity === 'all' ? undefined : entity, page);
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <Screen>
      <ThemedText type="title">Audit</ThemedText>
      <ShopDataLinks current="/admin/audit" />
      <SegmentedChoice
        label="What was edited"
        options={ENTITIES}
        value={entity}
        onChange={(value) => {
          setEntity(value);
          setPage(1);
        }}
      />
      {error ? (
        <ErrorState title="The audit could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the audit…" />
      ) : data.entries.length === 0 ? (
        <EmptyState title="Nothing edited yet">Edits to bike models, target profiles, engine settings and the shop settings are listed here.</EmptyState>
      ) : (
        <View style={{ gap: spacing.sm }}>
          {data.entries.map((entry) => (
            <Card key={entry.id}>
              <ThemedText type="bodyStrong">
                {ENTITY_NAMES[entry.entity](entry.entityKey)} {ACTIONS[entry.action]}
              </ThemedText>
              <ThemedText color="textMuted">
                {entry.actorName} · {new Date(entry.at).toLocaleString()}
              </ThemedText>
              {entry.entity === 'shop-settings'
                ? describeTermsChange(entry).map((line) => <ThemedText key={line}>{line}</ThemedText>)
                : null}
            </Card>
          ))}
          <View style={{ flexDirection: 'row', alignItems: 'center', gap: spacing.sm }}>
            <Button variant="secondary" label="Newer" disabled={page <= 1} onPress={() => setPage(page - 1)} />
            <ThemedText>
              Page {page} of {pages}
            </ThemedText>
            <Button variant="secondary" label="Older" disabled={page >= pages} onPress={() => setPage(page + 1)} />
          </View>
        </View>
      )}
    </Screen>
  );
}
