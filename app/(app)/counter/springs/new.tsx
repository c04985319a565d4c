import { useRouter } from 'expo-router';

import { SpringCreateForm } from '@/components/catalogue/spring-create-form';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useCreateSpring } from '@/hooks/use-springs';
import { useUnits } from '@/hooks/use-units';

export default function NewSpringScreen() {
  const router = useRouter();
  const { units } = useUnits();
  const create = useCreateSpring();
  return (
    <Screen>
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">New spring</ThemedText>
      <Card>
        <ThemedText role="note">
          The spring starts with no stock: once it is saved, receive the opening stock on its page, so the delivery is in
          the stock history.
        </ThemedText>
      </Card>
      <SpringCreateForm
        unit={units.rateUnit}
        onCreate={create}
        onDone={({ spring }) => router.replace({ pathname: '/counter/springs/[id]', params: { id: String(spring.id) } })}
      />
    </Screen>
  );
}
