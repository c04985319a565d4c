import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/api/client';
import { describeBatch, ImportBatches } from '@/components/catalogue/import-batches';
import { ImportReport } from '@/components/catalogue/import-report';
import { pickCsv } from '@/components/catalogue/pick-csv';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useImportSteps, type ImportFile } from '@/hooks/use-imports';
import { useTheme } from '@/theme';
import { RATE_UNITS, type ImportConfirmAnswer, type ImportDryRun } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

const UNIT_CHOICES = RATE_UNITS.map((unit) => ({ value: unit, label: unit }));

const messageOf = (error: unknown) => (error instanceof ApiError || error instanceof Error ? error.message : String(error));

/**
 * Pick a file, see what it would do, then confirm. Nothing is written before the confirm, which
 * sends the same file again with the dry run's token.
 */
export default function ImportScreen() {
  const { spacing } = useTheme();
  const steps = useImportSteps();
  const [file, setFile] = useState<ImportFile>();
  const [unit, setUnit] = useState<RateUnit>('N/mm');
  const [report, setReport] = useState<ImportDryRun>();
  const [done, setDone] = useState<ImportConfirmAnswer>();
  const [busy, setBusy] = useState(false);
  const [failure, setFailure] = useState<string>();

  const run = async (work: () => Promise<void>) => {
    setBusy(true);
    setFailure(undefined);
    try {
      await work();
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setBusy(false);
    }
  };

  const chooseAndDryRun = () =>
    run(async () => {
      const picked = await pickCsv();
      if (!picked) return;
      setFile(picked);
      setDone(undefined);
      setReport(undefined);
      setReport(await steps.dryRun(picked, unit));
    });

  const confirm = () =>
    run(async () => {
      if (!file || !report?.token) return;
      setDone(await steps.confirm(file, unit, report.token));
      setReport(undefined);
      setFile(undefined);
    });

  return (
    <Screen width="table">
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">Import a CSV</ThemedText>
      <ThemedText color="textMuted">
        The columns are those of the catalogue export (sku, kind, family, rate_n_mm, free_length_mm, max_deflection_mm and
        the rest); a rate column may name its unit, like rate_kgf_mm. A dry run shows what each row would do; nothing is
        written until you confirm.
      </ThemedText>
      <View style={{ gap: spacing.xs }}>
        <ThemedText type="label">Rate unit, for a file whose rate column names none</ThemedText>
        <SegmentedChoice
          label="Rate unit of the file"
          options={UNIT_CHOICES}
          value={unit}
          disabled={busy}
          onChange={(next) => {
            // The dry run's token covers the unit too, so a new unit means a new dry run.
            setUnit(next);
            setReport(undefined);
            setFile(undefined);
          }}
        />
      </View>
      <View style={[styles.row, { gap: spacing.sm }]}>
        <Button label={busy ? 'Working…' : report ? 'Choose another file' : 'Choose a CSV file'} disabled={busy} onPress={() => void chooseAndDryRun()} />
        {report?.token && <Button label={`Import ${report.counts.rows} rows`} disabled={busy} onPress={() => void confirm()} />}
      </View>
      {failure && (
        <Card tone="danger">
          <ThemedText role="alert">{failure}</ThemedText>
        </Card>
      )}
      {done && (
        <Card tone="success">
          <ThemedText role="status">{`Imported as batch #${done.batch.id}: ${describeBatch(done.batch)}.`}</ThemedText>
        </Card>
      )}
      {report && !report.token && (
        <Card tone="warning">
          <ThemedText role="status">Fix the rows with errors in the file, then choose it again: nothing is imported while any row has an error.</ThemedText>
        </Card>
      )}
      {report && <ImportReport report={report} />}
      <ThemedText type="heading">Past imports</ThemedText>
      <ImportBatches />
    </Screen>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap' } });
