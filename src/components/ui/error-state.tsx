import { Button } from './button';
import { Card } from './card';
import { ThemedText } from './themed-text';

export type ErrorStateProps = {
  title: string;
  /** The server's or the client's own explanation. */
  message: string;
  /** Offers to try again when given. */
  onRetry?: () => void;
  retrying?: boolean;
};

/** What could not be loaded, why, and a way to ask again. */
export function ErrorState({ title, message, onRetry, retrying = false }: ErrorStateProps) {
  return (
    <Card tone="danger">
      <ThemedText type="bodyStrong" role="alert">
        {title}
      </ThemedText>
      <ThemedText>{message}</ThemedText>
      {onRetry && (
        <Button
          variant="secondary"
          label={retrying ? 'Trying again…' : 'Try again'}
          disabled={retrying}
          onPress={onRetry}
        />
      )}
    </Card>
  );
}
