import { useState } from 'react';
import { View } from 'react-native';

import { describeChange } from '@/components/setup-log/change-text';
import { RideLoop } from '@/components/test-ride/ride-loop';
import { describeSetting, END_WORDS } from '@/components/test-ride/ride-words';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useSetupLog } from '@/hooks/use-setup-log';
import { useTestRides } from '@/hooks/use-test-rides';
import { useUnits } from '@/hooks/use-units';
import { damperLabel } from '@shared/damping/symptoms';
import { labelsOf } from '@shared/setup/damper-words';
import type { DamperKind } from '@shared/types/damping';
import type { GarageBike } from '@shared/types/garage';
import type { SetupLogEntry } from '@shared/types/setup-log';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { formatDateTime } from './quote-status';

const ENDS: readonly EndKind[] = ['front', 'rear'];

/** Rides listed while the section is closed; the loop lists them all. */
const RIDES_SHOWN = 3;

/** Log entries listed before "Show all". */
const LOG_SHOWN = 5;

/**
 * One bike's damping at the desk, closed to a few lines by default so a customer with several
 * bikes stays one short page: each adjuster's setting and the maker's standard, and the latest
 * test rides with where each stands. Opened, it is the rider's own test-ride loop (the desk runs
 * it with the customer at the counter) and the recent setup log, newest first, since the desk has
 * no screen of its own for the log.
 */
export function BikeDampingSection({ bike }: { bike: GarageBike }) {
  const { spacing, colors } = useTheme();
  const [open, setOpen] = useState(false);
  const kinds = useDamperKinds().data?.kinds;
  return (
    <View testID={`bike-damping-${bike.id}`} style={{ gap: spacing.md, borderTopWidth: 1, borderColor: colors.border, paddingTop: spacing.md }}>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm }}>
        <ThemedText type="label">Dampers and test rides</ThemedText>
        <Button
          variant="secondary"
          label={open ? 'Close the test rides' : 'Test rides and setup log'}
          aria-expanded={open}
          onPress={() => setOpen((shown) => !shown)}
          testID={`bike-damping-toggle-${bike.id}`}
        />
      </View>
      {open ? (
        <>
          <RideLoop bikeId={bike.id} />
          <RecentSetupLog bikeId={bike.id} kinds={kinds} />
        </>
      ) : (
        <>
          <DamperLines bike={bike} kinds={kinds} />
          <RecentRides bikeId={bike.id} />
        </>
      )}
    </View>
  );
}

/** "Rebound 12 clicks out · maker's standard 10 clicks out", one line per adjuster. */
function DamperLines({ bike, kinds }: { bike: GarageBike; kinds?: readonly DamperKind[] }) {
  const { spacing } = useTheme();
  const ends = ENDS.filter((end) => (bike[end]?.dampers.length ?? 0) > 0);
  if (ends.length === 0) return <ThemedText color="textMuted">No damping adjusters recorded for this bike.</ThemedText>;
  return (
    <View style={{ gap: spacing.xs }} testID={`bike-dampers-${bike.id}`}>
      {ends.map((end) => (
        <View key={end}>
          <ThemedText type="caption" color="textMuted">
            {END_WORDS[end]}
          </ThemedText>
          {bike[end]!.dampers.map((damper) => (
            <ThemedText key={damper.kind} testID={`bike-damper-${bike.id}-${end}-${damper.kind}`}>
              <ThemedText type="bodyStrong">{damperLabel(damper.kind, kinds)}</ThemedText> {describeSetting(damper.unit, damper.position)}
              <ThemedText color="textMuted">
                {' · '}
                {damper.standard === null ? 'maker’s standard not known' : `maker’s standard ${describeSetting(damper.unit, damper.standard)}`}
              </ThemedText>
            </ThemedText>
          ))}
        </View>
      ))}
    </View>
  );
}

function RecentRides({ bikeId }: { bikeId: number }) {
  const { spacing } = useTheme();
  const { data, error } = useTestRides(bikeId);
  if (error) return <ThemedText color="danger">{error.message}</ThemedText>;
  if (!data) return <LoadingState label="Loading the test rides…" />;
  if (data.rides.length === 0) return <ThemedText color="textMuted">No test rides reported yet.</ThemedText>;
  const more = data.rides.length - RIDES_SHOWN;
  return (
    <View style={{ gap: spacing.xs }} testID={`bike-rides-${bikeId}`}>
      <ThemedText type="caption" color="textMuted">
        Latest test rides, newest first
      </ThemedText>
      <View role="list" aria-label="Latest test rides" style={{ gap: spacing.sm }}>
        {data.rides.slice(0, RIDES_SHOWN).map((ride) => (
          <View key={ride.id} role="listitem" testID={`bike-ride-${ride.id}`}>
            <ThemedText type="bodyStrong">
              {ride.symptom.words} ({ride.strength}) · {END_WORDS[ride.end]}
            </ThemedText>
            <ThemedText type="caption" color="textMuted">
              {formatDateTime(ride.reported.at)}
            </ThemedText>
            <ThemedText testID={`bike-ride-${ride.id}-status`}>{ride.statusText}</ThemedText>
          </View>
        ))}
      </View>
      {more > 0 && (
        <ThemedText color="textMuted">
          and {more} earlier {more === 1 ? 'ride' : 'rides'}: open the test rides to see them all.
        </ThemedText>
      )}
    </View>
  );
}

/** As the rider's log names its entries; the note, under it, says what the change was for. */
function entryTitle(entry: SetupLogEntry): string {
  if (entry.kind === 'change') return 'Changed';
  return entry.sizing?.front?.riderSagMm != null || entry.sizing?.rear?.riderSagMm != null ? 'Sag measured' : 'Worked out from weights';
}

function RecentSetupLog({ bikeId, kinds }: { bikeId: number; kinds?: readonly DamperKind[] }) {
  const { spacing, colors } = useTheme();
  const { units } = useUnits();
  const { data, error, mutate } = useSetupLog(bikeId);
  const [all, setAll] = useState(false);
  const labels = labelsOf(kinds ?? []);
  let body;
  if (error) body = <ErrorState title="The setup log could not be loaded" message={error.message} onRetry={() => void mutate()} />;
  else if (!data) body = <LoadingState label="Loading the setup log…" />;
  else if (data.entries.length === 0) body = <ThemedText color="textMuted">Nothing logged yet.</ThemedText>;
  else {
    const newestFirst = [...data.entries].reverse();
    const shown = all ? newestFirst : newestFirst.slice(0, LOG_SHOWN);
    body = (
      <>
        <View role="list" aria-label="Setup log, newest first" style={{ gap: spacing.sm }}>
          {shown.map((entry) => (
            <View key={entry.id} role="listitem" testID={`desk-log-entry-${entry.id}`} style={{ borderTopWidth: 1, borderColor: colors.border, paddingTop: spacing.xs }}>
              <ThemedText type="bodyStrong">
                {entryTitle(entry)}
                <ThemedText type="caption" color="textMuted">
                  {' · '}
                  {formatDateTime(entry.createdAt)}
                </ThemedText>
              </ThemedText>
              {entry.note ? <ThemedText color="textMuted">{entry.note}</ThemedText> : null}
              {entry.changes.map((change) => {
                const line = describeChange(change, units, labels);
                return <ThemedText key={line}>{line}</ThemedText>;
              })}
            </View>
          ))}
        </View>
        {newestFirst.length > LOG_SHOWN && (
          <Button
            variant="secondary"
            label={all ? 'Show the latest only' : `Show all ${newestFirst.length} entries`}
            onPress={() => setAll((shown) => !shown)}
            testID={`desk-log-all-${bikeId}`}
          />
        )}
      </>
    );
  }
  return (
    <View style={{ gap: spacing.sm }} testID={`desk-setup-log-${bikeId}`}>
      <ThemedText type="heading">Setup log</ThemedText>
      {body}
    </View>
  );
}
