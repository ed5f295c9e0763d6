import { Button, Group, Paper, Text } from '@mantine/core';
import { IconClipboardCheck } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { canAccess } from '@/config/navigation';
import { paths } from '@/config/paths';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useOrders } from '@/api/orders/get-orders';
import { BEDSIDE_STATUSES } from '../utils/bedside-statuses';

/** On the patient page, for nurses: this patient's PCA orders that need the bedside, one click away. */
export function PatientBedsideLink({ patientId }: { patientId: number }) {
  const user = useCurrentUser();
  const mayAct = canAccess(user.role, 'bedside');
  const orders = useOrders({ patientId, status: BEDSIDE_STATUSES });
  const count = orders.data?.length ?? 0;
  if (!mayAct || count === 0) return null;
  const wardId = orders.data?.[0]?.wardId;
  return (
    <Paper withBorder radius="md" p="md">
      <Group justify="space-between" wrap="wrap" gap="sm">
        <Text>
          {count === 1 ? 'One PCA order' : `${count} PCA orders`} at the bedside: bedside check, clinician bolus, syringe change or
          discontinue.
        </Text>
        <Button
          component={Link}
          to={paths.bedside.getHref({ wardId, patientId })}
          leftSection={<IconClipboardCheck size={16} aria-hidden />}
        >
          Bedside PCA tasks
        </Button>
      </Group>
    </Paper>
  );
}
