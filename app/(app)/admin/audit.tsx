import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ChipChoice } from '@/components/catalogue/chip-choice';
import { formatMoney } from '@/components/catalogue/money';
import { describeKind } from '@/components/damping-rules/damper-kinds-panel';
import { describeRuleAudit } from '@/components/damping-rules/rule-audit';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useAudit } from '@/hooks/use-audit';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useTheme } from '@/theme';
import type { DamperKind } from '@shared/types/damping';
import type { AuditEntry } from '@shared/types/shop-data';
import type { ShopSettingsView } from '@shared/types/quote';

const ENTITIES = [
  { value: 'all', label: 'All' },
  { value: 'bike-model', label: 'Bike models' },
  { value: 'target-profile', label: 'Profiles' },
  { value: 'engine-setting', label: 'Settings' },
  { value: 'shop-settings', label: 'Shop settings' },
  { value: 'damper-kind', label: 'Adjuster kinds' },
  { value: 'damping-rule', label: 'Damping rules' },
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

/** The lines under an entry: what changed, for the entities whose rows say it in words. */
function describeEntry(entry: AuditEntry, kinds: readonly DamperKind[]): string[] {
  switch (entry.entity) {
    case 'shop-settings':
      return describeTermsChange(entry);
    case 'damping-rule':
      return describeRuleAudit(entry.before, entry.after, kinds);
    case 'damper-kind': {
      const kind = entry.after as DamperKind | null;
      return kind ? [`${kind.label}: ${describeKind(kind)}`] : [];
    }
    default:
      return [];
  }
}

const ENTITY_NAMES: Record<AuditEntry['entity'], (key: string) => string> = {
  'bike-model': (key) => `Bike model ${key}`,
  'target-profile': (key) => `Target profile ${key}`,
  'engine-setting': (key) => `Engine setting ${key}`,
  'shop-settings': () => 'Shop settings',
  'damper-kind': (key) => `Adjuster kind ${key}`,
  'damping-rule': (key) => `Damping rule ${key}`,
};

/** Who changed which shop data, when. */
export default function AuditScreen() {
  const { spacing } = useTheme();
  const [entity, setEntity] = useState<EntityChoice>('all');
  const [page, setPage] = useState(1);
  const { data, error, mutate } = useAudit(entity === 'all' ? undefined : entity, page);
  // Until the list loads (or if it cannot), adjusters read as the trade's labels or their keys.
  const kinds = useDamperKinds().data?.kinds ?? [];
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <Screen>
      <ThemedText type="title">Audit</ThemedText>
      <ShopDataLinks current="/admin/audit" />
      <ChipChoice
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
        <EmptyState title="Nothing edited yet">Edits to bike models, target profiles, engine settings, the shop settings, the adjuster kinds and the damping rules are listed here.</EmptyState>
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
              {describeEntry(entry, kinds).map((line) => (
                <ThemedText key={line}>{line}</ThemedText>
              ))}
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
