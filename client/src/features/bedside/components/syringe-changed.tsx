import { Button, Group, Stack, Text } from '@mantine/core';
import { IconClipboardCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { OrderDetail, SyringeChangeResponse } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { DonePanel } from './done-panel';
import { ReconciliationSummary } from './reconciliation-summary';

/** The old syringe reconciled; the new one waits for its own bedside check. */
export function SyringeChanged({ order, changed }: { order: OrderDetail; changed: SyringeChangeResponse }) {
  return (
    <DonePanel number={3} title={`Old syringe ${changed.reconciliation.releaseCode} finished`}>
      <Stack gap="lg">
        <ReconciliationSummary reconciliation={changed.reconciliation} flags={order.flags} />
        <Text fz="lg">
          Next: two nurses do a bedside check of the new syringe ({changed.newReleaseCode}). Nothing is copied from the old syringe: both
          nurses enter every setting again.
        </Text>
        <Group>
          <Button
            component={Link}
            to={paths.bedsideCheck.getHref(order.id)}
            size="lg"
            leftSection={<IconClipboardCheck size={20} aria-hidden />}
          >
            Start bedside check for the new syringe
          </Button>
        </Group>
      </Stack>
    </DonePanel>
  );
}
