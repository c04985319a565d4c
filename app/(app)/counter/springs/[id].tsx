import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { HoldList } from '@/components/catalogue/hold-list';
import { MovementList } from '@/components/catalogue/movement-list';
import { Pager } from '@/components/catalogue/pager';
import { SpringEditForm } from '@/components/catalogue/spring-edit-form';
import { SpringFacts } from '@/components/catalogue/spring-facts';
import { CountForm, HoldForm, ReceiveForm } from '@/components/catalogue/stock-forms';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { MOVEMENTS_PAGE_SIZE, useSpring, useSpringChanges, useSpringHolds } from '@/hooks/use-spring';
import { useUnits } from '@/hooks/use-units';
import { useTheme } from '@/theme';
import type { SpringDetail, StockAnswer } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

type Panel = 'receive' | 'count' | 'hold' | 'edit' | undefined;

export default function SpringDetailScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const springId = Number(id);
  const { units } = useUnits();
  const [page, setPage] = useState(1);
  const { data, error, isValidating, mutate } = useSpring(springId, units.rateUnit, page);

  return (
    <Screen width="table">
      <TextLink href="/counter">← Spring catalogue</TextLink>
      {error && !data ? (
        <ErrorState title="The spring could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />
      ) : !data ? (
        <LoadingState label="Loading the spring…" />
      ) : !('onHand' in data.spring) ? (
        <EmptyState title="This account does not see stock.">The parts counter keeps the stock figures.</EmptyState>
      ) : (
        <>
          <SpringBody spring={data.spring} unit={data.unit} />
          <ThemedText type="heading">Stock history</ThemedText>
          <TextLink href={{ pathname: '/counter/movements', params: { springId: String(springId), sku: data.spring.sku } }}>
            This spring in the stock ledger
          </TextLink>
          {data.movements && data.movements.total > 0 ? (
            <>
              <MovementList movements={data.movements.movements} />
              <Pager
                page={data.movements.page}
                pageSize={MOVEMENTS_PAGE_SIZE}
                total={data.movements.total}
                noun="movement"
                busy={isValidating}
                onPage={setPage}
              />
            </>
          ) : (
            <EmptyState title="No stock movements yet." />
          )}
        </>
      )}
    </Screen>
  );
}

function SpringBody({ spring, unit }: { spring: SpringDetail; unit: RateUnit }) {
  const { spacing } = useTheme();
  const changes = useSpringChanges(spring.id);
  const holds = useSpringHolds(spring.id);
  const [panel, setPanel] = useState<Panel>();
  const [notice, setNotice] = useState<string>();
  const [failure, setFailure] = useState<string>();

  const stockDone = (verb: string) => (answer: StockAnswer) => {
    setPanel(undefined);
    setNotice(`${verb}: on hand is now ${'onHand' in answer.spring ? answer.spring.onHand : '–'}.`);
  };
  const holdDone = (verb: string) => (answer: StockAnswer) => {
    setPanel(undefined);
    setNotice(`${verb} hold #${answer.hold?.id}: reserved is now ${'reserved' in answer.spring ? answer.spring.reserved : '–'}.`);
  };
  const open = (next: Panel) => {
    setNotice(undefined);
    setFailure(undefined);
    setPanel(panel === next ? undefined : next);
  };

  return (
    <>
      <ThemedText type="title">{spring.sku}</ThemedText>
      <ThemedText color="textMuted">{`${spring.kind} spring · ${spring.family}${spring.active ? '' : ' · inactive'}`}</ThemedText>
      {spring.belowReorderPoint && (
        <Card tone="warning">
          <ThemedText>{`Below its reorder point: ${spring.available} available, reorder at ${spring.reorderPoint}.`}</ThemedText>
        </Card>
      )}
      {notice && (
        <Card tone="success">
          <ThemedText role="status">{notice}</ThemedText>
        </Card>
      )}
      {failure && (
        <Card tone="danger">
          <ThemedText role="alert">{failure}</ThemedText>
        </Card>
      )}
      <SpringFacts spring={spring} unit={unit} />
      <View style={[styles.actions, { gap: spacing.sm }]}>
        <Button label="Receive stock" variant={panel === 'receive' ? 'primary' : 'secondary'} onPress={() => open('receive')} />
        <Button label="Correct the count" variant={panel === 'count' ? 'primary' : 'secondary'} onPress={() => open('count')} />
        <Button label="Hold springs" variant={panel === 'hold' ? 'primary' : 'secondary'} onPress={() => open('hold')} />
        <Button label="Edit details" variant={panel === 'edit' ? 'primary' : 'secondary'} onPress={() => open('edit')} />
        <Button
          variant="secondary"
          label={spring.active ? 'Deactivate' : 'Reactivate'}
          onPress={() => {
            setFailure(undefined);
            changes
              .setActive(!spring.active)
              .then(() => setNotice(spring.active ? 'Deactivated: it no longer shows to the desk or riders.' : 'Reactivated.'))
              .catch((error: unknown) => setFailure(error instanceof Error ? error.message : String(error)));
          }}
        />
      </View>
      {panel === 'receive' && (
        <Card>
          <ThemedText type="heading">Receive stock</ThemedText>
          <ReceiveForm onReceive={changes.receive} onDone={stockDone('Received')} />
        </Card>
      )}
      {panel === 'count' && (
        <Card>
          <ThemedText type="heading">Correct the count</ThemedText>
          <CountForm onCount={changes.count} onDone={stockDone('Count recorded')} />
        </Card>
      )}
      {panel === 'hold' && (
        <Card>
          <ThemedText type="heading">Hold springs</ThemedText>
          <HoldForm onHold={changes.hold} onDone={holdDone('Made')} />
        </Card>
      )}
      {panel === 'edit' && (
        <Card>
          <ThemedText type="heading">Edit details</ThemedText>
          <SpringEditForm spring={spring} unit={unit} onSave={changes.update} onDone={() => setPanel(undefined)} />
        </Card>
      )}
      <Card>
        <ThemedText type="heading">Who holds them</ThemedText>
        {holds.error && !holds.data ? (
          <ThemedText role="alert" color="danger">{`The holds could not be loaded: ${holds.error.message}`}</ThemedText>
        ) : !holds.data ? (
          <LoadingState label="Loading the holds…" />
        ) : holds.data.holds.length === 0 ? (
          <ThemedText color="textMuted">Nothing is held: every unit on hand is available.</ThemedText>
        ) : (
          <HoldList holds={holds.data.holds} onRelease={changes.release} onOverride={changes.overrideRelease} onDone={holdDone('Released from')} />
        )}
      </Card>
    </>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap' } });
