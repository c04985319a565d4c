import { Link, router } from 'expo-router';
import { useState } from 'react';
import { Pressable, View } from 'react-native';

import { WalkInForm } from '@/components/quotes/walk-in-form';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Input } from '@/components/ui/input';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { createCustomer, useCustomers } from '@/hooks/use-customers';
import { useTheme } from '@/theme';

/**
 * Riders found by name or e-mail; one opens to their bikes and saved sizing records. A walk-in is
 * added here and lands on their page, where the desk adds the bike and weighs them in.
 */
export default function CustomersScreen() {
  const { colors, radii, spacing } = useTheme();
  const [query, setQuery] = useState('');
  const [addingWalkIn, setAddingWalkIn] = useState(false);
  const { data, error, isLoading, mutate } = useCustomers(query.trim());
  return (
    <Screen>
      <TextLink href="/desk">← All quotes</TextLink>
      <ThemedText type="title">Customers</ThemedText>
      {addingWalkIn ? (
        <Card testID="walk-in">
          <ThemedText type="heading">New walk-in customer</ThemedText>
          <WalkInForm
            onCreate={async (input) => {
              const customer = await createCustomer(input);
              setAddingWalkIn(false);
              router.push({ pathname: '/desk/customers/[id]', params: { id: String(customer.id), name: customer.name } });
            }}
          />
          <Button label="Cancel" variant="secondary" onPress={() => setAddingWalkIn(false)} />
        </Card>
      ) : (
        <Button label="New walk-in customer" variant="secondary" onPress={() => setAddingWalkIn(true)} />
      )}
      <Input
        accessibilityLabel="Search by name or e-mail"
        placeholder="Name or e-mail"
        value={query}
        onChangeText={setQuery}
        autoCapitalize="none"
        autoCorrect={false}
      />
      {isLoading && !data ? (
        <LoadingState label="Looking for customers…" />
      ) : error ? (
        <ErrorState title="The customers could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : data && data.customers.length === 0 ? (
        <EmptyState title="No customer matches.">Try part of the name or of the e-mail address.</EmptyState>
      ) : (
        <View role="list" style={{ gap: spacing.sm }}>
          {data?.customers.map((customer) => (
            <Link
              key={customer.id}
              href={{ pathname: '/desk/customers/[id]', params: { id: String(customer.id), name: customer.name } }}
              asChild
            >
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`${customer.name}, ${customer.email}`}
                // A plain style: the link that wraps the row drops a style given as a function.
                style={{
                  backgroundColor: colors.surface,
                  borderColor: colors.border,
                  borderWidth: 1,
                  borderRadius: radii.md,
                  padding: spacing.md,
                }}
              >
                <ThemedText type="bodyStrong">{customer.name}</ThemedText>
                <ThemedText color="textMuted">
                  {customer.email} · {customer.bikes} {customer.bikes === 1 ? 'bike' : 'bikes'}
                </ThemedText>
              </Pressable>
            </Link>
          ))}
        </View>
      )}
    </Screen>
  );
}
