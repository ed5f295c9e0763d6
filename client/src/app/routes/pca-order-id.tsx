import { Anchor, Stack, Text, Title } from '@mantine/core';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The order id in a PCA address, or null when the address does not name an order. */
export function usePcaOrderId(): number | null {
  const { orderId } = useParams();
  const id = Number(orderId);
  return Number.isInteger(id) && id > 0 ? id : null;
}

export function NotAPcaOrder() {
  return (
    <Stack gap="sm">
      <Title order={1}>PCA not found</Title>
      <Text>This address does not name a PCA order.</Text>
      <Anchor component={Link} to={paths.patients.getHref()}>
        Back to patients
      </Anchor>
    </Stack>
  );
}
