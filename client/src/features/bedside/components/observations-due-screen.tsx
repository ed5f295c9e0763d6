import { useMemo } from 'react';
import { Alert, Stack, Text, Title } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import type { Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useNow } from '@/hooks/use-now';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrders } from '@/api/orders/get-orders';
import { observationsDue } from '@/utils/order-alerts';
import { useWardChoice } from '../hooks/use-ward-choice';
import { ALL_WARDS, observationsDueSummary, onChosenWards, wardsPhrase } from '../utils/ward-choice';
import { BedsideCaution } from './bedside-caution';
import { BedsideOrdersTable } from './bedside-orders-table';
import { WardChoiceFilter } from './ward-choice-filter';

export interface ObservationsDueScreenProps {
  wards: readonly Ward[];
  wardsLoading: boolean;
}

/** The running PCAs on the nurse's wards by when their next observation is due, overdue first: her round. */
export function ObservationsDueScreen({ wards, wardsLoading }: ObservationsDueScreenProps) {
  const user = useCurrentUser();
  const { wards: choice, source, ownWardIds, choose } = useWardChoice(wards);
  // Only the chosen wards are asked of the server (in one order, so the cached answer is shared).
  const wardIds = choice === ALL_WARDS ? undefined : [...choice].sort((a, b) => a - b);
  // The same list and schedule as the PCA orders screen; asked again each time it is shown and every minute.
  const ordersQuery = useOrders({ wardIds, status: ['active'] }, { staleTime: 0, refetchInterval: 60_000 });
  // The chosen wards only, also while another choice's answer stands in.
  const orders = useMemo(() => observationsDue(onChosenWards(ordersQuery.data ?? [], choice)), [ordersQuery.data, choice]);
  const now = useNow(30_000);
  // While the wards load, the person's own wards still have names.
  const phrase = wardsPhrase(choice, wards.length > 0 ? wards : user.wards);

  return (
    <Stack gap="md">
      <Title order={1}>Observations due</Title>
      <Text size="sm" c="dimmed">
        Running PCAs, the next observation soonest first. Observations tighten to every 15 minutes after a start, a change or an urgent
        flag, by the ward’s policy.
      </Text>
      <WardChoiceFilter wards={wards} wardsLoading={wardsLoading} choice={choice} ownWardIds={ownWardIds} onChange={choose} />
      {source === 'no-own-wards' ? (
        <Alert variant="light" color="blue" icon={<IconInfoCircle aria-hidden />} title="Every ward is shown">
          You are not assigned to a ward, so the list shows every ward’s running PCAs. An administrator can assign your wards; meanwhile
          choose the wards you are looking after above.
        </Alert>
      ) : null}
      {ordersQuery.isError ? (
        <QueryErrorAlert
          title="Observations due could not be loaded"
          error={ordersQuery.error}
          onRetry={() => void ordersQuery.refetch()}
        />
      ) : (
        <>
          <Text fw={600} aria-live="polite" data-testid="observations-due-summary">
            {/* Another ward's answer may stand in while the chosen wards load: no count until they have. */}
            {ordersQuery.isPending || ordersQuery.isPlaceholderData ? phrase : observationsDueSummary(phrase, orders.length)}
          </Text>
          <BedsideOrdersTable
            orders={orders}
            now={now}
            isLoading={ordersQuery.isPending}
            emptyMessage={choice === ALL_WARDS ? 'No PCA is running.' : `No PCA is running on ${phrase}.`}
          />
        </>
      )}
      <BedsideCaution />
    </Stack>
  );
}
