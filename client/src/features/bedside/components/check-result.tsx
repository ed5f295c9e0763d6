import { Anchor, Button, Group, Stack, Table, Text, ThemeIcon } from '@mantine/core';
import { IconAlertTriangle, IconCircleCheck, IconRefresh } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import type { Drug, SecondCheckResponse, OrderDetail } from '@lockstep/shared';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';
import { differenceRows, type CheckNurses } from '../utils/setting-differences';
import { BackToOrdersButton } from './back-to-orders-button';
import { StepPanel } from './step-panel';

export interface CheckResultProps {
  order: OrderDetail;
  result: SecondCheckResponse;
  /** The order was already running: this check started a new syringe, not the PCA. */
  newSyringe: boolean;
  completedAt: string;
  nurses: CheckNurses;
  drugs: readonly Drug[];
  stepCount: number;
  onRestart: () => void;
}

/** Step 5: a full match starts the PCA; any difference starts nothing and names what to correct. */
export function CheckResult(props: CheckResultProps) {
  return props.result.status === 'matched' ? <Matched {...props} /> : <Mismatch {...props} />;
}

function Matched({ order, newSyringe, completedAt, stepCount }: CheckResultProps) {
  const startedAt = newSyringe ? completedAt : (order.startedAt ?? completedAt);
  const icon = (
    <ThemeIcon color="teal" size={44} radius="xl" variant="light">
      <IconCircleCheck size={30} aria-hidden />
    </ThemeIcon>
  );
  return (
    <StepPanel number={5} of={stepCount} title={newSyringe ? 'Matched — new syringe started' : 'Matched — PCA started'} icon={icon}>
      <Stack gap="md">
        <Text fz="lg">
          Both entries match the verified order. {newSyringe ? 'The new syringe' : 'The PCA'} started at{' '}
          <Text span fw={700} inherit className="tabular-nums">
            {formatDateTime(startedAt)}
          </Text>
          .
        </Text>
        <Group gap="xs">
          <Text>Order status:</Text>
          <OrderStatusBadge status={order.status} size="lg" />
        </Group>
        <Text c="dimmed">Hand the button to the patient and start observations as the ward plan says.</Text>
        <Group>
          <BackToOrdersButton wardId={order.wardId} />
          <Anchor component={Link} to={paths.patient.getHref(order.patientId)}>
            Open the patient
          </Anchor>
        </Group>
      </Stack>
    </StepPanel>
  );
}

/** An entry that differs from the order: bold and red, beside the column that names whose it is. */
function wrongEntry(differs: boolean) {
  return differs ? { c: 'red.8', fw: 700 } : {};
}

function Mismatch({ order, result, nurses, drugs, stepCount, onRestart }: CheckResultProps) {
  const rows = differenceRows(result.differences, order.doseUnit, drugs, nurses);
  const icon = (
    <ThemeIcon color="red" size={44} radius="xl" variant="light">
      <IconAlertTriangle size={28} aria-hidden />
    </ThemeIcon>
  );
  return (
    <StepPanel number={5} of={stepCount} title="Not matched — nothing started" icon={icon}>
      <Stack gap="md">
        <Text fz="lg">
          The PCA has not started. Correct {rows.length === 1 ? 'this setting' : 'these settings'} on the pump, then start a new check: both
          nurses enter every setting again.
        </Text>
        <Table.ScrollContainer minWidth={640}>
          <Table aria-label="Settings to correct on the pump" tabularNums fz="md" verticalSpacing="sm" withTableBorder>
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Setting</Table.Th>
                <Table.Th>Whose entry differs</Table.Th>
                <Table.Th>First entry</Table.Th>
                <Table.Th>Second entry</Table.Th>
                <Table.Th>Ordered</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {rows.map((row) => (
                <Table.Tr key={row.field}>
                  <Table.Th scope="row">{row.label}</Table.Th>
                  <Table.Td>{row.whose}</Table.Td>
                  <Table.Td {...wrongEntry(row.differs !== 'second')}>{row.first}</Table.Td>
                  <Table.Td {...wrongEntry(row.differs !== 'first')}>{row.second}</Table.Td>
                  <Table.Td fw={700}>{row.ordered}</Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
        <Group gap="xs">
          <Text>Order status:</Text>
          <OrderStatusBadge status={order.status} size="lg" />
        </Group>
        <Group>
          <Button size="lg" leftSection={<IconRefresh size={20} aria-hidden />} onClick={onRestart}>
            Start a new check
          </Button>
        </Group>
      </Stack>
    </StepPanel>
  );
}
