import { Anchor, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Page not found');
  return (
    <Stack gap="sm">
      <Title order={1}>Page not found</Title>
      <Text>There is no Lockstep screen at this address.</Text>
      <Anchor component={Link} to={paths.root.getHref()}>
        Go to your home screen
      </Anchor>
    </Stack>
  );
}
