import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useBike } from '@/hooks/use-bikes';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useTestRideActions, useTestRides } from '@/hooks/use-test-rides';
import { mayEnter } from '@/session/access';
import { useSignedInUser } from '@/session/session-provider';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { DamperPlansSection } from './damper-plans-section';
import { DampersSummary } from './dampers-summary';
import { NoChangeCard } from './no-change-card';
import { ProposalCard } from './proposal-card';
import { ReportForm } from './report-form';
import { RideHistory } from './ride-history';
import { UndoCard } from './undo-card';

const ENDS: readonly EndKind[] = ['front', 'rear'];

/**
 * The test-ride loop of one bike, for the rider's screen and the desk's customer page alike: what
 * to do now (the open change to make or judge, a worse change to turn back, the last answer), the
 * report of what the bike did, the dampers as set, the way back to the maker's standard or the
 * baseline, and every ride so far. One change at a time: while a made change waits for its
 * verdict, nothing new can be reported.
 */
export function RideLoop({ bikeId }: { bikeId: number }) {
  const { spacing } = useTheme();
  const { role } = useSignedInUser();
  const isRider = mayEnter(role, 'rider');
  const rides = useTestRides(bikeId);
  const bike = useBike(bikeId);
  const kinds = useDamperKinds().data?.kinds;
  const actions = useTestRideActions(bikeId);
  const [notice, setNotice] = useState<string | null>(null);
  const [reportInstead, setReportInstead] = useState(false);

  const error = rides.error ?? bike.error;
  if (error) {
    return (
      <ErrorState
        title="The test rides could not be loaded"
        message={error.message}
        onRetry={() => void Promise.all([rides.mutate(), bike.mutate()])}
      />
    );
  }
  if (!rides.data || !bike.data) return <LoadingState label="Loading the test rides…" />;

  const { open } = rides.data;
  const current = bike.data.bike;
  const latest = rides.data.rides[0];
  const toUndo = rides.data.rides.filter((ride) => ride.undoPlan && !ride.undoPlan.atTarget);
  const ends = ENDS.filter((end) => current[end] !== null);
  const formShown = !open || (open.status === 'to-make' && reportInstead);

  /** Each step's answer as a line above, replacing the last one. */
  const say = (line: string | null) => setNotice(line);

  return (
    <View style={{ gap: spacing.lg }} testID="ride-loop">
      {notice && (
        <Card tone="success" testID="ride-notice">
          <ThemedText>{notice}</ThemedText>
        </Card>
      )}
      {open && (
        <ProposalCard
          ride={open}
          kinds={kinds}
          onMade={async () => {
            const { entry } = await actions.made(open.id);
            say(`Made: “${entry.note}” is in the setup log. Now ride, then say how it went.`);
          }}
          onOutcome={async (input) => {
            const { ride } = await actions.outcome(open.id, input);
            // A worse ride's way back is the undo card's to show.
            say(input.outcome === 'worse' ? null : ride.statusText);
          }}
        />
      )}
      {toUndo.map((ride) => (
        <UndoCard
          key={ride.id}
          ride={ride}
          onUndo={async () => {
            const { entry } = await actions.undo(ride.id);
            say(`Turned back: “${entry.note}” is in the setup log. Report again when you have ridden.`);
          }}
        />
      ))}
      {latest?.status === 'no-change' && <NoChangeCard ride={latest} canOpenResults={isRider} />}
      {open?.status === 'to-make' && (
        <Button
          variant="secondary"
          label={reportInstead ? 'Keep to this change' : 'Report something else instead'}
          onPress={() => setReportInstead((shown) => !shown)}
          testID="ride-report-instead"
        />
      )}
      {formShown && (
        <Card>
          <ThemedText type="heading">{latest ? 'Report the next ride' : 'After a ride: what did the bike do?'}</ThemedText>
          <ThemedText color="textMuted">
            {open
              ? 'A new report closes the change above without making it.'
              : 'One report at a time, one end at a time. The answer is one change to try, or why there is none.'}
          </ThemedText>
          <ReportForm
            ends={ends}
            onReport={async (input) => {
              const answer = await actions.report(input);
              setReportInstead(false);
              say(answer.supersededText);
            }}
          />
        </Card>
      )}
      <DampersSummary bike={current} kinds={kinds} />
      <DamperPlansSection bikeId={bikeId} baselineTitle={isRider ? 'Back to my baseline' : 'Back to the rider’s baseline'} />
      <RideHistory rides={rides.data.rides} />
    </View>
  );
}
