import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { ShopSettingsForm } from '@/components/quotes/shop-settings-form';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useShopSettings } from '@/hooks/use-shop-settings';

/** What every quote is priced with: labour rate, tax, deposit, operations, validity and cautions. */
export default function ShopSettingsScreen() {
  const { data, error, mutate, save } = useShopSettings();
  return (
    <Screen>
      <ThemedText type="title">Shop settings</ThemedText>
      <ShopDataLinks current="/admin/shop-settings" />
      <ThemedText color="textMuted">New quotes use these; quotes already made keep the values they were priced with.</ThemedText>
      {error ? (
        <ErrorState title="The shop settings could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the shop settings…" />
      ) : (
        <ShopSettingsForm settings={data.settings} save={save} />
      )}
    </Screen>
  );
}
