import type { ReactNode } from 'react';
import { Group, Paper, Stack, Text } from '@mantine/core';
import { drugAndConcentration, formatRegimen, tallMan, type OrderDetail } from '@lockstep/shared';
import { usePatient } from '@/api/patients/get-patient';
import { AllergyList } from '@/components/ui/allergy-list';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <Stack gap={0}>
      <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
        {label}
      </Text>
      <Text fw={600} fz="lg" className="tabular-nums">
        {children}
      </Text>
    </Stack>
  );
}

export interface OrderContextProps {
  order: OrderDetail;
  /**
   * Shows the ordered regimen. Off during a bedside check: the nurses read the pump, never the
   * order, until both entries are compared.
   */
  showRegimen?: boolean;
}

/** Which patient, bed and drug this screen is about, and the patient's allergies: the first things a nurse checks. */
export function OrderContext({ order, showRegimen = false }: OrderContextProps) {
  const patient = usePatient(order.patientId);
  return (
    <Paper withBorder radius="md" p="md" bg="slate.0" aria-label="Patient and order" component="section">
      <Group gap="xl" align="flex-start" wrap="wrap">
        <Fact label="Patient">{order.patientName}</Fact>
        <Fact label="Ward and bed">
          {order.wardName}, bed {order.bed}
        </Fact>
        <Fact label="Drug">{showRegimen ? drugAndConcentration(order) : tallMan(order.drugName)}</Fact>
        <Stack gap={4}>
          <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
            Order status
          </Text>
          <OrderStatusBadge status={order.status} size="lg" />
        </Stack>
      </Group>
      <Stack gap={4} mt="sm" aria-label="Allergies">
        <Text size="xs" c="dimmed" tt="uppercase" fw={600}>
          Allergies
        </Text>
        {patient.data ? (
          <AllergyList patient={patient.data} />
        ) : (
          <Text size="sm" c="dimmed">
            {patient.isError ? 'The allergies could not be loaded: check the patient’s record' : 'Loading…'}
          </Text>
        )}
      </Stack>
      {showRegimen ? (
        <Text size="sm" mt="sm" className="tabular-nums">
          {formatRegimen(order, { withDrug: false })}
        </Text>
      ) : null}
    </Paper>
  );
}
