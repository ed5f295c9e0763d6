import { lazy, Suspense } from 'react';
import { Group, SegmentedControl, Skeleton, Stack, Text, Title } from '@mantine/core';
import { DECISION_SUPPORT_CAUTION } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useObservations } from '@/api/orders/get-observations';
import { useUsage } from '@/api/orders/get-usage';
import { USAGE_WINDOWS, type UsageWindow } from '../utils/usage-windows';
import { NextObservation } from './next-observation';
import { UsageFigures } from './usage-figures';

// The charting library is the heaviest part of the page: it loads after the figures show.
const UsageCharts = lazy(() => import('./usage-charts').then((module) => ({ default: module.UsageCharts })));

export interface UsageSectionProps {
  orderId: number;
  hours: UsageWindow;
  onHoursChange: (hours: UsageWindow) => void;
  now: Date;
}

/** The next observation due, the usage figures and the charts over the chosen window. */
export function UsageSection({ orderId, hours, onHoursChange, now }: UsageSectionProps) {
  const usage = useUsage(orderId, hours);
  const observations = useObservations(orderId);

  if (usage.isError) {
    return <QueryErrorAlert title="Usage could not be loaded" error={usage.error} onRetry={() => void usage.refetch()} />;
  }
  return (
    <Stack gap="md">
      {usage.data?.nextObservation ? <NextObservation due={usage.data.nextObservation} now={now} /> : null}
      <Stack gap="sm" component="section" aria-labelledby="pca-usage-heading">
        <Group justify="space-between" wrap="wrap" gap="sm">
          <Title order={2} id="pca-usage-heading">
            Usage
          </Title>
          <Group gap="xs">
            <Text size="sm" c="dimmed" id="pca-window-label">
              Hours shown
            </Text>
            <SegmentedControl
              aria-labelledby="pca-window-label"
              value={String(hours)}
              onChange={(value) => onHoursChange(Number(value) as UsageWindow)}
              data={USAGE_WINDOWS.map((window) => ({ value: String(window), label: `${window} h` }))}
            />
          </Group>
        </Group>
        <Text size="xs" c="dimmed">
          {DECISION_SUPPORT_CAUTION}
        </Text>
        {usage.data ? <UsageFigures usage={usage.data} now={now} /> : <Skeleton height={180} />}
        {usage.data && observations.data ? (
          <Suspense fallback={<Skeleton height={520} aria-label="Loading the charts" />}>
            <UsageCharts usage={usage.data} observations={observations.data} />
          </Suspense>
        ) : (
          <Skeleton height={520} />
        )}
      </Stack>
    </Stack>
  );
}
