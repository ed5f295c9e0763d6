import { memo } from 'react';
import { SimpleGrid } from '@mantine/core';
import type { ObservationResponse, UsageResponse } from '@lockstep/shared';
import { bucketWindow } from '../utils/chart-data';
import { AttemptsChart } from './attempts-chart';
import { CumulativeDoseChart } from './cumulative-dose-chart';
import { PainSedationChart } from './pain-sedation-chart';

export interface UsageChartsProps {
  usage: UsageResponse;
  observations: readonly ObservationResponse[];
}

/**
 * The PCA page's charts. Loaded on their own (the charting library is large), after the
 * figures and flags a nurse reads first. Memoised: an acknowledged flag or the clock ticking
 * re-renders the page, and drawing the charts again is the slowest part of it.
 */
export const UsageCharts = memo(function UsageCharts({ usage, observations }: UsageChartsProps) {
  return (
    <SimpleGrid cols={{ base: 1, lg: 2 }} spacing="md" style={{ alignItems: 'start' }}>
      <AttemptsChart buckets={usage.buckets} />
      <PainSedationChart observations={observations} window={bucketWindow(usage.buckets)} />
      <CumulativeDoseChart buckets={usage.buckets} doseUnit={usage.doseUnit} />
    </SimpleGrid>
  );
});
