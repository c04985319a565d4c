import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';

export default function ShopScreen() {
  return (
    <Screen>
      <ThemedText type="title">Shop</ThemedText>
      <ThemedText>
        Run the shop from here: who may sign in and with which role, and the shop data every sizing
        starts from (bike models, target profiles, engine settings) under Shop data.
      </ThemedText>
      <Card>
        <ThemedText type="heading">Users</ThemedText>
        <ThemedText color="textMuted">
          Find an account, change its role, switch it off or on, or create one for a member of
          staff.
        </ThemedText>
        <TextLink href="/admin/users">Manage users</TextLink>
      </Card>
      <Card>
        <ThemedText type="heading">Outbox</ThemedText>
        <ThemedText color="textMuted">
          On a development server, the mails the app would have sent, such as password resets,
          wait here instead.
        </ThemedText>
        <TextLink href="/admin/outbox">Open the outbox</TextLink>
      </Card>
    </Screen>
  );
}
