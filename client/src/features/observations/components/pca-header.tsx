import type { ReactNode } from 'react';
import { Badge, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconCircleOff, IconPlayerPlay } from '@tabler/icons-react';
import { drugAndConcentration, ORDER_STATUS_LABELS, REGIMEN_TYPE_LABELS, regimenParts, type OrderDetail } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';

export interface PcaHeaderProps {
  order: OrderDetail;
  /** "Record observation", for those who may. */
  actions?: ReactNode;
}

/** Whose PCA this is, the drug in tall-man letters and the ordered regimen in safe format. */
export function PcaHeader({ order, actions }: PcaHeaderProps) {
  const running = order.status === 'active';
  const StatusIcon = running ? IconPlayerPlay : IconCircleOff;
  return (
    <Paper withBorder radius="md" p="md">
      <Stack gap="sm">
        <Group justify="space-between" align="flex-start" wrap="wrap" gap="sm">
          <Stack gap={2}>
            <Title order={1}>PCA: {order.patientName}</Title>
            <Group gap="sm" wrap="wrap">
              <Text c="dimmed" className="tabular-nums">
                MRN {order.patientMrn} · {order.wardName} bed {order.bed}
              </Text>
              <Badge color={running ? 'green' : 'gray'} variant="light" leftSection={<StatusIcon size={12} aria-hidden />}>
                {ORDER_STATUS_LABELS[order.status]}
              </Badge>
            </Group>
          </Stack>
          {actions}
        </Group>
        <Group gap="xs" align="baseline" wrap="wrap">
          <Text fz="xl" fw={700} data-testid="pca-drug">
            {drugAndConcentration(order)}
          </Text>
          <Text c="dimmed">{REGIMEN_TYPE_LABELS[order.regimenType]}</Text>
        </Group>
        <Group gap="lg" wrap="wrap" component="dl" m={0} aria-label="Ordered regimen">
          {regimenParts(order).map((part) => (
            <div key={part.label}>
              <Text component="dt" size="xs" c="dimmed">
                {part.label}
              </Text>
              <Text component="dd" m={0} fw={600} className="tabular-nums">
                {part.value}
              </Text>
            </div>
          ))}
        </Group>
        <Text size="sm" c="dimmed">
          Prescribed by {order.prescriberName}
          {order.startedAt ? ` · started ${formatDateTime(order.startedAt)}` : ''}
        </Text>
      </Stack>
    </Paper>
  );
}
