import { Stack, Text, Title } from '@mantine/core';

/** For an address whose order number is not a number. */
export function NotAnOrder() {
  return (
    <Stack gap="sm">
      <Title order={1}>Order not found</Title>
      <Text>This address does not name a PCA order.</Text>
    </Stack>
  );
}
