import { Text } from '@mantine/core';
import { formatRegimen, type OrderSummary } from '@lockstep/shared';

/** Whose order it is and its regimen, at the top of a dialog that acts on it. */
export function OrderInBrief({ order, withMrn = true }: { order: OrderSummary; withMrn?: boolean }) {
  return (
    <>
      <Text size="sm">
        {order.patientName}
        {withMrn ? `, MRN ${order.patientMrn}` : ''}, {order.wardName} bed {order.bed}
      </Text>
      <Text size="sm" fw={600} className="tabular-nums">
        {formatRegimen(order)}
      </Text>
    </>
  );
}
