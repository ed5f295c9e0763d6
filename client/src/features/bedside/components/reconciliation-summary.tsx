import { Group, Stack, Table, Text } from '@mantine/core';
import { IconCircleCheck } from '@tabler/icons-react';
import { formatDose, type FlagResponse, type ReleaseReconciliation } from '@lockstep/shared';
import { reconciliationFlag, reconciliationRows } from '../utils/reconciliation-display';
import { FlagAlert } from './flag-alert';

export interface ReconciliationSummaryProps {
  reconciliation: ReleaseReconciliation;
  /** The order's flags, to show the review flag the server raised for a discrepancy. */
  flags: readonly FlagResponse[];
}

/** What was dispensed against what was infused and wasted, and whether pharmacy must review it. */
export function ReconciliationSummary({ reconciliation, flags }: ReconciliationSummaryProps) {
  const rows = reconciliationRows(reconciliation);
  const flag = reconciliation.mustReport ? reconciliationFlag(flags, reconciliation.releaseCode) : undefined;
  return (
    <Stack gap="md">
      <Table
        aria-label={`Reconciliation of syringe ${reconciliation.releaseCode}`}
        tabularNums
        fz="md"
        verticalSpacing="sm"
        withTableBorder
        maw={560}
      >
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr key={row.label}>
              <Table.Th scope="row" w="45%">
                {row.label}
              </Table.Th>
              <Table.Td fw={row.label === 'Discrepancy' ? 700 : undefined}>{row.value}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      {reconciliation.mustReport ? (
        <FlagAlert
          flag={
            flag ?? {
              severity: 'review',
              message: `Syringe ${reconciliation.releaseCode}: ${formatDose(reconciliation.discrepancyMl, 'mL')} is over the ward’s tolerance.`,
              action: 'Pharmacy to review the controlled-drug record with the ward and report per local policy',
            }
          }
        />
      ) : (
        <Group gap="xs" c="teal.8">
          <IconCircleCheck size={20} aria-hidden />
          <Text fw={600}>Within the ward’s tolerance: nothing to report.</Text>
        </Group>
      )}
      {reconciliation.mustReport ? <Text size="sm">Pharmacy has been e-mailed about this discrepancy.</Text> : null}
    </Stack>
  );
}
