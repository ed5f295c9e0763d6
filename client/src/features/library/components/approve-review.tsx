import type { ComponentType } from 'react';
import { Alert, Group, List, Skeleton, Stack, Text, ThemeIcon, Title } from '@mantine/core';
import { IconAlertTriangle, IconBan, IconCircleCheck, IconUsers, type IconProps } from '@tabler/icons-react';
import { formatDose, tallMan, type Finding, type LibraryAffectedOrder } from '@lockstep/shared';
import { largeChangesFirst, type ChangeRow } from '../utils/diff-rows';
import { ChangeDirectionBadge } from './change-direction';
import { LargeChangeBadge } from './large-change-badge';

const SEVERITY: Partial<Record<Finding['severity'], { word: string; color: string; Icon: ComponentType<IconProps> }>> = {
  hard: { word: 'Hard limit', color: 'red', Icon: IconBan },
  soft: { word: 'Soft limit', color: 'orange', Icon: IconAlertTriangle },
};

export interface ApproveReviewProps {
  /** The version's changed limits (diff-rows); null while loading. */
  rows: readonly ChangeRow[] | null;
  addedRules: number;
  removedRules: number;
  /** Open orders the new limits would put outside; null while loading, undefined if they could not be read. */
  affected: { checked: number; orders: readonly LibraryAffectedOrder[] } | null | undefined;
}

function ChangeLine({ row }: { row: ChangeRow }) {
  return (
    <Group gap={8} wrap="wrap" data-change-row>
      {row.large ? <LargeChangeBadge change={row.large} /> : <ChangeDirectionBadge direction={row.direction} />}
      <Text size="sm">
        <Text span fw={600} size="sm">
          {row.rule}
        </Text>{' '}
        · {row.what}: {row.from} → {row.to}
      </Text>
    </Group>
  );
}

function AffectedOrder({ order }: { order: LibraryAffectedOrder }) {
  return (
    <Stack gap={4} data-affected-order={order.orderId}>
      <Text size="sm" fw={600}>
        Bed {order.bed}, {order.patientName}: {tallMan(order.drugName)} {formatDose(order.concentrationPerMl, `${order.doseUnit}/mL`)}{' '}
        (order {order.orderId}, {order.status === 'active' ? 'running' : 'verified'})
      </Text>
      {order.findings.map((finding, index) => {
        const look = SEVERITY[finding.severity];
        if (!look) return null;
        return (
          <Group key={index} gap={6} wrap="nowrap" align="flex-start">
            <ThemeIcon size={20} variant="light" color={look.color} radius="xl" aria-hidden>
              <look.Icon size={13} />
            </ThemeIcon>
            <Text size="sm">
              <Text span fw={600} c={`${look.color}.8`} size="sm">
                {look.word}:
              </Text>{' '}
              {finding.message}
            </Text>
          </Group>
        );
      })}
    </Stack>
  );
}

/**
 * What the approver signs for: the large changes first (a factor of 2 or more, or to or from no
 * limit), then the other changes, and the running orders the new limits would put outside.
 */
export function ApproveReview({ rows, addedRules, removedRules, affected }: ApproveReviewProps) {
  const ordered = rows ? largeChangesFirst(rows) : null;
  const large = ordered?.filter((row) => row.large !== null) ?? [];
  const other = ordered?.filter((row) => row.large === null) ?? [];
  return (
    <Stack gap="md">
      <Stack gap="xs">
        <Title order={4}>Changes from the active version</Title>
        {ordered === null ? <Skeleton height={60} /> : null}
        {large.length > 0 ? (
          <Alert color="red" variant="light" icon={<IconAlertTriangle aria-hidden />} title={`Large changes (${large.length})`}>
            <Stack gap={6}>
              {large.map((row) => (
                <ChangeLine key={row.key} row={row} />
              ))}
            </Stack>
          </Alert>
        ) : null}
        {other.length > 0 ? (
          <Stack gap={6} aria-label="Other changes">
            <Text size="sm" fw={600}>
              Other changes ({other.length})
            </Text>
            {other.map((row) => (
              <ChangeLine key={row.key} row={row} />
            ))}
          </Stack>
        ) : null}
        {ordered !== null ? (
          <Text size="xs" c="dimmed">
            {ordered.length} limits changed, {addedRules} rules added, {removedRules} rules removed.
          </Text>
        ) : null}
      </Stack>

      <Stack gap="xs">
        <Title order={4}>Running orders outside the new limits</Title>
        {affected === null ? <Skeleton height={40} /> : null}
        {affected === undefined ? (
          <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="Running orders could not be checked">
            Check the ward&apos;s running orders against the new limits before approving.
          </Alert>
        ) : null}
        {affected && affected.orders.length > 0 ? (
          <Alert
            color="orange"
            variant="light"
            icon={<IconUsers aria-hidden />}
            title={`${affected.orders.length} of ${affected.checked} open orders`}
          >
            <List spacing="sm" listStyleType="none">
              {affected.orders.map((order) => (
                <List.Item key={order.orderId}>
                  <AffectedOrder order={order} />
                </List.Item>
              ))}
            </List>
          </Alert>
        ) : null}
        {affected && affected.orders.length === 0 ? (
          <Group gap={6}>
            <IconCircleCheck size={16} aria-hidden color="var(--mantine-color-teal-7)" />
            <Text size="sm">
              None: the {affected.checked} verified or running {affected.checked === 1 ? 'order is' : 'orders are'} within the new limits.
            </Text>
          </Group>
        ) : null}
      </Stack>
    </Stack>
  );
}
