import type { ReactNode } from 'react';

import { Card } from './card';
import { ThemedText } from './themed-text';

/** Said where a list has nothing to show, with what would fill it. */
export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <Card>
      <ThemedText type="bodyStrong">{title}</ThemedText>
      {children && <ThemedText color="textMuted">{children}</ThemedText>}
    </Card>
  );
}
