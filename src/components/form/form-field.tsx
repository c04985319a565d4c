import { useId, type ReactNode } from 'react';
import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

export type FieldIds = {
  /** The hint's and the error's ids, as `aria-describedby` wants them. */
  describedBy: string | undefined;
};

export type FormFieldProps = {
  label: string;
  hint?: string;
  /** Shown under the control; undefined while the value is fine. */
  error?: string;
  /** Draws the control, given the ids that describe it. */
  children: (ids: FieldIds) => ReactNode;
};

/** A label above a control, a hint under the label, and the error under the control. */
export function FormField({ label, hint, error, children }: FormFieldProps) {
  const { spacing } = useTheme();
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(' ') || undefined;
  return (
    <View style={{ gap: spacing.xs }}>
      <ThemedText type="label">{label}</ThemedText>
      {hint && (
        <ThemedText type="caption" color="textMuted" nativeID={hintId}>
          {hint}
        </ThemedText>
      )}
      {children({ describedBy })}
      {error && (
        <ThemedText type="caption" color="danger" nativeID={errorId} aria-live="polite">
          {error}
        </ThemedText>
      )}
    </View>
  );
}
