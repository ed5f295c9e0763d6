import type { ComponentType } from 'react';
import { Anchor, Button, Group, Skeleton, Stack, Table, Text } from '@mantine/core';
import { IconClipboardCheck, IconClipboardHeart, IconDroplet, IconPlayerStop, IconReplace, type IconProps } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { type BedsideAction, bedsideActions, drugAndConcentration, type OrderListEntry, regimenPhrases } from '@lockstep/shared';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';
import { PausedBadge } from '@/components/ui/paused-badge';
import { SeverityBadge } from '@/components/ui/severity-badge';
import { paths } from '@/config/paths';
import { urgentFlagsLabel } from '@/utils/order-alerts';
import { bedsideHint } from '../utils/syringe-state';
import { NextObservationHint } from './next-observation-hint';

const ACTIONS: Record<
  BedsideAction,
  { label: string; icon: ComponentType<IconProps>; href: (orderId: number) => string; variant: string }
> = {
  check: { label: 'Start bedside check', icon: IconClipboardCheck, href: (id) => paths.bedsideCheck.getHref(id), variant: 'filled' },
  observe: { label: 'Record observation', icon: IconClipboardHeart, href: (id) => paths.pcaObserve.getHref(id), variant: 'default' },
  bolus: { label: 'Clinician bolus', icon: IconDroplet, href: (id) => paths.bedsideBolus.getHref(id), variant: 'default' },
  'syringe-change': {
    label: 'Change syringe',
    icon: IconReplace,
    href: (id) => paths.bedsideSyringeChange.getHref(id),
    variant: 'default',
  },
  discontinue: { label: 'Discontinue', icon: IconPlayerStop, href: (id) => paths.bedsideDiscontinue.getHref(id), variant: 'default' },
};

export interface BedsideOrdersTableProps {
  /** Each with its syringe state and next observation, as the list answers them. */
  orders: readonly OrderListEntry[];
  now: Date;
  isLoading: boolean;
  emptyMessage: string;
}

function OrderActions({ order }: { order: OrderListEntry }) {
  const syringes = order.syringeState;
  return (
    <Group gap="xs" wrap="wrap">
      {bedsideActions(order.status, syringes).map((action) => {
        const { label, icon: Icon, href, variant } = ACTIONS[action];
        // A check needs a syringe from pharmacy; without one the button would only lead to a refusal.
        const waiting = action === 'check' && syringes === 'none';
        const common = { variant, size: 'sm', leftSection: <Icon size={16} aria-hidden /> } as const;
        if (waiting) {
          return (
            <Button key={action} {...common} disabled>
              {label}
            </Button>
          );
        }
        return (
          <Button key={action} {...common} component={Link} to={href(order.id)}>
            {label}
          </Button>
        );
      })}
    </Group>
  );
}

/** "demand 0.2 mg · lockout 10 min · …", each part kept on one line. */
function RegimenParts({ parts }: { parts: readonly string[] }) {
  return parts.map((part, index) => (
    <span key={part}>
      {index > 0 ? ' · ' : null}
      <span style={{ whiteSpace: 'nowrap' }}>{part}</span>
    </span>
  ));
}

/** The ward's PCA orders at the bedside: who, where, what runs, and what to do next. */
export function BedsideOrdersTable({ orders, now, isLoading, emptyMessage }: BedsideOrdersTableProps) {
  return (
    <Table.ScrollContainer minWidth={900}>
      <Table aria-label="PCA orders" aria-busy={isLoading || undefined} tabularNums verticalSpacing="sm" fz="sm">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Bed</Table.Th>
            <Table.Th>Patient</Table.Th>
            <Table.Th>PCA</Table.Th>
            <Table.Th>Status</Table.Th>
            <Table.Th>Actions</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {isLoading
            ? Array.from({ length: 3 }, (_, index) => (
                <Table.Tr key={`skeleton-${index}`} aria-hidden>
                  {Array.from({ length: 5 }, (_, cell) => (
                    <Table.Td key={cell}>
                      <Skeleton height={14} />
                    </Table.Td>
                  ))}
                </Table.Tr>
              ))
            : orders.map((order) => {
                const hint = bedsideHint(order.status, order.syringeState);
                const due = order.nextObservation;
                return (
                  <Table.Tr key={order.id}>
                    <Table.Td>
                      <Text fw={600} size="sm">
                        {order.bed}
                      </Text>
                      <Text size="xs" c="dimmed">
                        {order.wardName}
                      </Text>
                    </Table.Td>
                    <Table.Th scope="row" fw={600} style={{ whiteSpace: 'nowrap' }}>
                      {order.patientName}
                    </Table.Th>
                    <Table.Td>
                      <Stack gap={2}>
                        {order.status === 'active' ? (
                          <Anchor
                            component={Link}
                            to={paths.pca.getHref(order.id)}
                            fw={600}
                            size="sm"
                            aria-label={`${drugAndConcentration(order)}: open the PCA page for ${order.patientName}`}
                          >
                            {drugAndConcentration(order)}
                          </Anchor>
                        ) : (
                          <Text fw={600} size="sm">
                            {drugAndConcentration(order)}
                          </Text>
                        )}
                        <Text size="xs" c="dimmed">
                          <RegimenParts parts={regimenPhrases(order, { withDrug: false })} />
                        </Text>
                      </Stack>
                    </Table.Td>
                    <Table.Td miw={170}>
                      <Stack gap={4} align="flex-start">
                        <OrderStatusBadge status={order.status} size="md" />
                        {order.paused ? <PausedBadge /> : null}
                        {hint ? (
                          <Text size="xs" c="dimmed">
                            {hint}
                          </Text>
                        ) : null}
                        {order.openUrgentFlags > 0 ? (
                          <SeverityBadge severity="urgent" size="sm" label={urgentFlagsLabel(order.openUrgentFlags)} />
                        ) : null}
                        {due ? <NextObservationHint due={due} now={now} /> : null}
                      </Stack>
                    </Table.Td>
                    <Table.Td>
                      <OrderActions order={order} />
                    </Table.Td>
                  </Table.Tr>
                );
              })}
          {!isLoading && orders.length === 0 ? (
            <Table.Tr>
              <Table.Td colSpan={5}>
                <Text c="dimmed" py="md">
                  {emptyMessage}
                </Text>
              </Table.Td>
            </Table.Tr>
          ) : null}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
