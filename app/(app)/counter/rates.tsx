import { BikeModelRates } from '@/components/catalogue/bike-model-rates';
import { FitRates } from '@/components/catalogue/fit-rates';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useUnits } from '@/hooks/use-units';

export default function RatesScreen() {
  const { units } = useUnits();
  return (
    <Screen width="table">
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">Rates in stock</ThemedText>
      <Card>
        <ThemedText type="heading">For a fit</ThemedText>
        <FitRates unit={units.rateUnit} />
      </Card>
      <Card>
        <ThemedText type="heading">For a bike model</ThemedText>
        <BikeModelRates unit={units.rateUnit} />
      </Card>
    </Screen>
  );
}
