import { useState } from 'react';

import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';

import { downloadCsv } from './download-csv';

export type DownloadButtonProps = { label: string; path: string; fileName: string };

/** A button that saves one CSV export, and says so when it could not. */
export function DownloadButton({ label, path, fileName }: DownloadButtonProps) {
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();
  return (
    <>
      <Button
        variant="secondary"
        label={busy ? 'Preparing…' : label}
        disabled={busy}
        onPress={() => {
          setBusy(true);
          setFailure(undefined);
          downloadCsv(path, fileName)
            .catch((error: unknown) => setFailure(error instanceof Error ? error.message : String(error)))
            .finally(() => setBusy(false));
        }}
      />
      {failure && (
        <ThemedText role="alert" color="danger">
          {`${label} failed: ${failure}`}
        </ThemedText>
      )}
    </>
  );
}
