import { useMemo } from 'react';
import { Alert, Anchor, Group, Stack, Text, Title } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { Link, useSearchParams } from 'react-router-dom';
import type { Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useNow } from '@/hooks/use-now';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrders } from '@/api/orders/get-orders';
import { useWardChoice } from '../hooks/use-ward-choice';
import { BEDSIDE_STATUSES } from '../utils/bedside-statuses';
import { byWardAndBed } from '../utils/order-sort';
import { ALL_WARDS, bedsideOrdersSummary, onChosenWards, wardParamValue, wardsPhrase } from '../utils/ward-choice';
import { BedsideCaution } from './bedside-caution';
import { BedsideOrdersTable } from './bedside-orders-table';
import { WardChoiceFilter } from './ward-choice-filter';

export interface BedsideOrdersScreenProps {
  wards: readonly Ward[];
  wardsLoading: boolean;
}

function positiveId(value: string | null): number | undefined {
  const id = Number(value);
  return value && Number.isInteger(id) && id > 0 ? id : undefined;
}

/** The nurse's PCA orders: waiting for a bedside check, or running, on the chosen wards (her own by default). */
export function BedsideOrdersScreen({ wards, wardsLoading }: BedsideOrdersScreenProps) {
  const user = useCurrentUser();
  // Wards and patient live in the address, so "back" from a bedside task returns to the same list.
  const [searchParams] = useSearchParams();
  const patientId = positiveId(searchParams.get('patient'));
  // A link to one patient's orders shows them wherever the patient lies.
  const { wards: choice, source, ownWardIds, choose } = useWardChoice(wards, { defaultAll: patientId !== undefined });
  // Only the chosen wards are asked of the server (in one order, so the cached answer is shared).
  const wardIds = choice === ALL_WARDS ? undefined : [...choice].sort((a, b) => a - b);

  // One request: each order comes with its syringe state and next observation. Asked again each time the list is shown.
  const ordersQuery = useOrders({ wardIds, patientId, status: BEDSIDE_STATUSES }, { staleTime: 0 });
  // The chosen wards only, also while another choice's answer stands in.
  const orders = useMemo(() => onChosenWards(ordersQuery.data ?? [], choice).sort(byWardAndBed), [ordersQuery.data, choice]);
  const now = useNow(30_000);
  // While the wards load, the person's own wards still have names.
  const phrase = wardsPhrase(choice, wards.length > 0 ? wards : user.wards);

  return (
    <Stack gap="md">
      <Title order={1}>PCA orders</Title>
      <WardChoiceFilter wards={wards} wardsLoading={wardsLoading} choice={choice} ownWardIds={ownWardIds} onChange={choose} />
      {source === 'no-own-wards' ? (
        <Alert variant="light" color="blue" icon={<IconInfoCircle aria-hidden />} title="Every ward is shown">
          You are not assigned to a ward, so the list shows every ward’s PCA orders. An administrator can assign your wards; meanwhile
          choose the wards you are looking after above.
        </Alert>
      ) : null}
      {patientId ? (
        <Group gap="xs">
          <Text size="sm">Showing one patient’s PCA orders.</Text>
          <Anchor component={Link} to={{ search: `?ward=${wardParamValue(choice)}` }} size="sm">
            Show every patient on {choice === ALL_WARDS ? 'every ward' : phrase}
          </Anchor>
        </Group>
      ) : null}
      {ordersQuery.isError ? (
        <QueryErrorAlert title="PCA orders could not be loaded" error={ordersQuery.error} onRetry={() => void ordersQuery.refetch()} />
      ) : (
        <>
          {patientId ? null : (
            <Text fw={600} aria-live="polite" data-testid="bedside-orders-summary">
              {/* Another ward's answer may stand in while the chosen wards load: no count until they have. */}
              {ordersQuery.isPending || ordersQuery.isPlaceholderData ? phrase : bedsideOrdersSummary(phrase, orders.length)}
            </Text>
          )}
          <BedsideOrdersTable
            orders={orders}
            now={now}
            isLoading={ordersQuery.isPending}
            emptyMessage="No PCA order here is waiting for a bedside check or running."
          />
        </>
      )}
      <BedsideCaution />
    </Stack>
  );
}
