import { useState } from 'react';

import { FlowNav } from '@/components/flow/flow-nav';
import { FlowProgress } from '@/components/flow/flow-progress';
import { useMeasureFlow } from '@/components/flow/measure-context';
import { stepsFor } from '@/components/flow/measure-state';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import type { EndKind } from '@shared/types/sizing';

type Choice = 'both' | EndKind;

/** Which ends to measure: only those the bike has values for. */
export default function EndsStep() {
  const { bike, state, moveTo } = useMeasureFlow();
  const available: EndKind[] = [...(bike.front ? ['front' as const] : []), ...(bike.rear ? ['rear' as const] : [])];
  const initial = state.answers.ends?.length === 1 ? state.answers.ends[0] : available.length === 2 ? 'both' : available[0];
  const [choice, setChoice] = useState<Choice>(initial);
  const [busy, setBusy] = useState(false);
  const options = [
    ...(available.length === 2 ? [{ value: 'both' as const, label: 'Both' }] : []),
    ...available.map((end) => ({ value: end, label: end === 'front' ? 'Front' : 'Rear' })),
  ];
  async function next() {
    const ends = choice === 'both' ? available : [choice];
    setBusy(true);
    try {
      await moveTo(stepsFor(ends)[2], { type: 'ends-chosen', ends });
    } finally {
      setBusy(false);
    }
  }
  return (
    <Screen>
      <FlowProgress step="ends" ends={choice === 'both' ? available : [choice]} />
      <ThemedText type="title">Which ends?</ThemedText>
      <ThemedText>
        Measure both for a full picture; one end alone is fine after changing only that end. Each end takes three readings: lifted, on its wheels, and with you aboard.
      </ThemedText>
      <SegmentedChoice label="Ends to measure" options={options} value={choice} onChange={setChoice} testID="ends-choice" />
      <FlowNav busy={busy} onBack={() => void moveTo('weigh-in')} onNext={() => void next()} />
    </Screen>
  );
}
