import { ThemedText } from '@/components/ui/themed-text';
import { useUnits } from '@/hooks/use-units';
import type { TextType } from '@/theme';

import { formatQuantity, type QuantityKind } from './format';

export type QuantityProps = {
  /** In SI: mm, kg, N/mm or N. */
  value: number | null | undefined;
  kind: QuantityKind;
  digits?: number;
  type?: TextType;
  testID?: string;
};

/** One figure in the person's units, with its unit; a dash when there is none. */
export function Quantity({ value, kind, digits, type = 'figure', testID }: QuantityProps) {
  const { units } = useUnits();
  return (
    <ThemedText type={type} testID={testID}>
      {value === null || value === undefined ? '–' : formatQuantity(value, kind, units, digits)}
    </ThemedText>
  );
}
