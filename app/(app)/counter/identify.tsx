import { useState } from 'react';

import { IdentifyForm } from '@/components/catalogue/identify-form';
import { RateMatches } from '@/components/catalogue/rate-matches';
import { formatRate } from '@/components/catalogue/rate-text';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { identifySpring } from '@/hooks/use-identify';
import { useUnits } from '@/hooks/use-units';
import { formatNumber } from '@shared/sizing/format';
import type { IdentifyAnswer } from '@shared/types/catalogue';

export default function IdentifyScreen() {
  const { units } = useUnits();
  const [answer, setAnswer] = useState<IdentifyAnswer>();
  return (
    <Screen>
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">Identify a spring</ThemedText>
      <Card tone="warning">
        <ThemedText role="note">
          A loaded spring stores dangerous energy. Measure a spring only when it is off the bike and unloaded.
        </ThemedText>
      </Card>
      <IdentifyForm unit={units.rateUnit} onIdentify={async (input) => setAnswer(await identifySpring(input))} />
      {answer && (
        <Card>
          <ThemedText type="heading">{`About ${formatRate(answer.rateInUnit, answer.unit)}`}</ThemedText>
          <ThemedText color="textMuted">
            {`Between ${formatRate(answer.rateRangeInUnit[0], answer.unit)} and ${formatRate(answer.rateRangeInUnit[1], answer.unit)} · mean diameter ${formatNumber(answer.meanDiameterMm, 1)} mm · ${formatNumber(answer.activeCoils, 1)} active coils · spring index ${formatNumber(answer.springIndex, 1)}`}
          </ThemedText>
          {answer.notes.map((note) => (
            <ThemedText key={note} type="caption">
              {note}
            </ThemedText>
          ))}
          <ThemedText type="heading">Nearest catalogue rates</ThemedText>
          <RateMatches matches={answer.matches} unit={answer.unit} />
        </Card>
      )}
    </Screen>
  );
}
