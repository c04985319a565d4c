import { Link } from 'expo-router';
import { Pressable, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import { formatNumber } from '@shared/sizing/format';
import type { RateMatch } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { rateText, springHref } from './spring-list';

/** Catalogue rates nearest a target, each with how far off it is and how many are available. */
export function RateMatches({ matches, unit }: { matches: readonly RateMatch[]; unit: RateUnit }) {
  const { spacing } = useTheme();
  if (matches.length === 0) {
    return <EmptyState title="No spring of this fit is in stock.">Order one, or look at a neighbouring family.</EmptyState>;
  }
  return (
    <View role="list" aria-label="Nearest rates" style={{ gap: spacing.sm }}>
      {matches.map(({ spring, differencePct }) => (
        <Link key={spring.id} href={springHref(spring.id)} asChild>
          <Pressable role="listitem" aria-label={`${spring.sku}, ${rateText(spring, unit)}`}>
            <Card>
              <ThemedText type="bodyStrong">{`${spring.sku} · ${rateText(spring, unit)}`}</ThemedText>
              <ThemedText type="caption" color="textMuted">
                {`${differencePct === 0 ? 'on target' : `${differencePct > 0 ? '+' : ''}${formatNumber(differencePct, 1)} % from target`} · ${spring.available} available`}
              </ThemedText>
            </Card>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}
