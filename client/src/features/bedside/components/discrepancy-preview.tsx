import { Paper, Text } from '@mantine/core';
import { formatDose } from '@lockstep/shared';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';
import { discrepancyText, previewDiscrepancy } from '../utils/reconciliation-display';

export interface DiscrepancyPreviewProps {
  dispensedMl: number;
  infused: NumberFieldValue;
  wasted: NumberFieldValue;
}

/** What the two nurses are about to sign for: dispensed against infused and wasted. */
export function DiscrepancyPreview({ dispensedMl, infused, wasted }: DiscrepancyPreviewProps) {
  const discrepancy = previewDiscrepancy(dispensedMl, readNumber(infused), readNumber(wasted));
  if (discrepancy === undefined) return null;
  return (
    <Paper withBorder radius="md" p="md" bg="slate.0" aria-label="What you are signing for" component="section">
      <Text className="tabular-nums">
        Dispensed {formatDose(dispensedMl, 'mL')} · infused {formatDose(readNumber(infused) ?? NaN, 'mL')} · wasted{' '}
        {formatDose(readNumber(wasted) ?? NaN, 'mL')}
      </Text>
      <Text fw={700} mt={4} className="tabular-nums">
        Discrepancy: {discrepancyText(discrepancy)}
      </Text>
      {discrepancy !== 0 ? (
        <Text size="sm" c="dimmed" mt={4}>
          Over the ward’s tolerance, pharmacy is told and a review flag is raised. Check both volumes before signing.
        </Text>
      ) : null}
    </Paper>
  );
}
